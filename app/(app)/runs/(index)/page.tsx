import type { Metadata } from "next";
import { ButtonLink } from "@/components/ui/button-link";
import { Card } from "@/components/ui/card";
import { PageHeading } from "@/components/ui/page-heading";
import { PickupHistory } from "@/components/runs/pickup-history";
import { RunList } from "@/components/runs/run-list";
import { requirePageRole } from "@/lib/auth/session";
import { groupLook } from "@/lib/format/group-look-queries";
import { pickupHistory } from "@/lib/runs/planner-queries";
import { listRuns } from "@/lib/runs/queries";

export const metadata: Metadata = { title: "Pickup runs" };

export default async function RunsPage() {
  const actor = await requirePageRole("/runs", "organiser", "volunteer");
  const [runs, look] = await Promise.all([listRuns(actor), groupLook(actor.group.id)]);
  if (actor.role !== "organiser") {
    return (
      <main className="flex flex-col gap-4">
        <h1 className="text-3xl">Your pickup runs</h1>
        <Card>
          <RunList look={look} runs={runs} empty="No runs for you yet. An organiser will send you one by e-mail." />
        </Card>
      </main>
    );
  }
  const history = await pickupHistory(actor.group.id);
  const by = (state: string) => runs.filter((r) => r.state === state);
  return (
    <main className="flex flex-col gap-4">
      <PageHeading title="Pickup runs">
        <ButtonLink href="/runs/new">Plan a run</ButtonLink>
      </PageHeading>
      <Card title="Under way">
        <RunList look={look} runs={by("under_way")} empty="No run is under way." />
      </Card>
      <Card title="Planned">
        <RunList look={look} runs={by("planned")} empty="No runs planned. Plan one to empty the fullest bins." />
      </Card>
      <Card title="Done">
        <RunList look={look} runs={by("done")} empty="No finished runs yet." />
      </Card>
      <Card title="Cancelled">
        <RunList look={look} runs={by("cancelled")} empty="No cancelled runs." />
      </Card>
      <Card title="Pickup history by drop point">
        <PickupHistory points={history} look={look} />
      </Card>
    </main>
  );
}
