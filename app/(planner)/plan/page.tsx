import type { Metadata } from "next";
import { Planner } from "@/components/heaters/planner";
import { getActor } from "@/lib/auth/session";
import { pageDrive } from "@/lib/drives/current-drive-queries";
import { groupLatitude, listGroupDrives } from "@/lib/heaters/queries";

export const metadata: Metadata = { title: "Heater planner" };
export const dynamic = "force-dynamic";

// Mid-latitude default for visitors; a signed-in group gets its workshop's latitude.
const DEFAULT_LATITUDE = 45;

/** The drives a saved plan may count against, opening on the person's drive (remembered, else running today). */
async function saveChoice(actor: NonNullable<Awaited<ReturnType<typeof getActor>>>) {
  const drives = await listGroupDrives(actor.group.id);
  const { drive, today } = await pageDrive(actor, drives);
  return { drives: drives.map((d) => ({ id: d.id, name: d.name, startsOn: d.startsOn, endsOn: d.endsOn })), initialId: drive?.id ?? null, today };
}

export default async function PlanPage() {
  const actor = await getActor();
  const canSave = actor !== null && (actor.role === "builder" || actor.role === "organiser");
  const drives = canSave ? await saveChoice(actor) : null;
  const latitude = actor ? ((await groupLatitude(actor.group.id)) ?? DEFAULT_LATITUDE) : DEFAULT_LATITUDE;
  return (
    <main id="main" className="mx-auto flex max-w-5xl flex-col gap-5 px-4 py-6">
      <div>
        <h1 className="text-3xl">Heater planner</h1>
        <p className="mt-2 max-w-prose text-ink-soft">
          Start from the glazing sheet you can get: see how many can columns and rows fit behind it, the holes to punch, the box&apos;s outer
          size, the materials and an estimate of the heat. Compare sheet sizes side by side.
        </p>
      </div>
      <Planner drives={drives} canSave={canSave} latitude={Math.round(latitude * 100) / 100} today={new Date().toISOString().slice(0, 10)} />
    </main>
  );
}
