import type { Metadata } from "next";
import { Card } from "@/components/ui/card";
import { GroupLookForm } from "@/components/settings/group-look-form";
import { requirePageRole } from "@/lib/auth/session";
import { groupLook } from "@/lib/format/group-look-queries";

export const metadata: Metadata = { title: "Group settings" };

/** Every IANA zone this server's Intl knows, plus UTC (which Intl.supportedValuesOf leaves out). */
function timeZones(current: string): string[] {
  const zones = new Set(["UTC", ...Intl.supportedValuesOf("timeZone"), current]);
  return [...zones].sort();
}

export default async function GroupSettingsPage() {
  const actor = await requirePageRole("/organise/group", "organiser");
  const look = await groupLook(actor.group.id);
  return (
    <main className="flex flex-col gap-6">
      <h1 className="text-3xl">Settings for {actor.group.name}</h1>
      <Card title="How dates, numbers and measures are shown">
        <GroupLookForm look={look} timeZones={timeZones(look.timeZone)} />
      </Card>
    </main>
  );
}
