import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Card } from "@/components/ui/card";
import { ButtonLink } from "@/components/ui/button-link";
import { GridFigures } from "@/components/heaters/grid-figures";
import { GridPreview } from "@/components/heaters/grid-preview";
import { ClaimsPanel } from "@/components/heaters/claims-panel";
import { Prefetched } from "@/components/query/prefetched";
import { heaterKeys, ledgerKeys } from "@/hooks/queries/keys";
import { DriveProgressLine } from "@/components/heaters/drive-progress-line";
import { StateBadge } from "@/components/heaters/state-badge";
import { StateMover } from "@/components/heaters/state-mover";
import { ArchiveUnit } from "@/components/heaters/archive-unit";
import { GlazingEditor } from "@/components/heaters/glazing-editor";
import { AppError } from "@/lib/api/errors";
import { requirePageRole } from "@/lib/auth/session";
import { computeCanGrid } from "@/lib/heaters/can-grid";
import { listDriveTargets } from "@/lib/heaters/drive-targets";
import { formatLength } from "@/lib/heaters/format";
import { groupLook } from "@/lib/format/group-look-queries";
import { lengthUnitOf } from "@/lib/format/measures";
import { getHeaterUnit, listHeaterUnits, planOf } from "@/lib/heaters/queries";
import { driveStock } from "@/lib/ledger/balances";
import { listHeatersWithClaims } from "@/lib/heaters/queries";
import { unitRefusal } from "@/lib/heaters/builder-rule";
import { allowedMoves } from "@/lib/heaters/states";

export const metadata: Metadata = { title: "Heater unit" };

type Props = { params: Promise<{ id: string }> };

export default async function UnitPage({ params }: Props) {
  const { id } = await params;
  const actor = await requirePageRole(`/units/${id}`, "builder", "organiser");
  const unit = await getHeaterUnit(actor.group.id, id).catch((e) => {
    if (e instanceof AppError && e.code === "not_found") notFound();
    throw e;
  });
  // Lengths in the group's units, whatever unit the plan was saved in.
  const look = await groupLook(actor.group.id);
  const plan = planOf(unit, lengthUnitOf(look.units));
  const grid = computeCanGrid(plan);
  const [drive] = unit.driveId ? await listDriveTargets(actor.group.id, unit.driveId) : [];
  const [summaries, stock, siblings] = unit.driveId
    ? await Promise.all([listHeatersWithClaims(actor.group.id), driveStock(actor.group.id, unit.driveId), listHeaterUnits(actor.group.id, unit.driveId)])
    : [[], null, []];
  const summary = summaries.find((u) => u.id === unit.id);
  // The same rule the routes apply (lib/heaters/resolve-unit.ts): offer only what the server allows.
  const refusal = unitRefusal({ role: actor.role, userId: actor.user.id }, unit, "claim");
  return (
    <main className="flex flex-col gap-5">
      <p>
        <Link href="/units" className="tap">← All heater units</Link>
      </p>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <div>
          <h1 className="text-3xl">{unit.name}</h1>
          <p className="mt-1 flex flex-wrap items-center gap-2 text-ink-soft">
            <StateBadge state={unit.state} />
            {unit.driveName ? <span>Counted against {unit.driveName}</span> : <span>Not counted against a drive</span>}
            {unit.builderName ? <span>· built by {unit.builderName}</span> : null}
          </p>
        </div>
        <ButtonLink href={`/units/${unit.id}/sheet`} variant="secondary">
          Build sheet
        </ButtonLink>
      </div>

      {unit.archivedAt ? (
        <p role="note" className="rounded-lg border-2 border-ink/40 bg-paper-deep p-3 font-semibold">
          Archived: this unit is hidden from the lists and counts toward no target. Restore it below to use it again.
        </p>
      ) : null}

      {unit.archivedAt ? null : (
      <Card title="State">
        <StateMover
          id={unit.id}
          state={unit.state}
          moves={allowedMoves(unit.state, actor.role)}
          refusal={unitRefusal({ role: actor.role, userId: actor.user.id }, unit, "state")}
        />
        <p className="mt-2 text-sm text-ink-faint">
          Units move forward: planned → gathering cans → being built → on the wall. Only an organiser can step one back.
        </p>
      </Card>
      )}

      {drive ? (
        <Card title="The drive">
          <p className="mb-1 font-semibold">{drive.name}</p>
          <DriveProgressLine drive={drive} />
        </Card>
      ) : null}

      {summary && stock && unit.driveId && !unit.archivedAt ? (
        <Card title="Cans for this unit">
          <Prefetched data={[[ledgerKeys.stock(unit.driveId), stock], [heaterKeys.list(), summaries]]}>
          <ClaimsPanel
            v={{
              unit: { ...summary, state: unit.state },
              driveId: unit.driveId,
              rows: unit.rows,
              installed: unit.state === "installed",
              isOrganiser: actor.role === "organiser",
              refusal,
              otherUnits: siblings.filter((u) => u.id !== unit.id && u.state !== "installed").map((u) => ({ id: u.id, name: u.name })),
            }}
          />
          </Prefetched>
          <p className="mt-3 text-sm text-ink-faint">Cut and punched cans are sharp: handle them with gloves.</p>
        </Card>
      ) : null}

      <Card title={unit.archivedAt ? "Archived" : "Archive"}>
        <ArchiveUnit id={unit.id} archived={unit.archivedAt !== null} claimed={summary?.claimed ?? 0} builtIn={summary?.builtIn ?? 0} />
      </Card>

      <Card title="Can grid">
        <p className="mb-3 text-ink-soft">
          Glazing {formatLength(plan.glazingWidth, plan.unit, look)} × {formatLength(plan.glazingHeight, plan.unit, look)}, covering{" "}
          {unit.coverage === "full" ? "the chamber and both manifolds" : "the can chamber only"}.
        </p>
        <div className="grid gap-4 md:grid-cols-[1fr_18rem]">
          <GridFigures grid={grid} />
          <GridPreview plan={plan} grid={grid} title={`${unit.name}: ${grid.columns} by ${grid.rows} cans`} />
        </div>
      </Card>

      {actor.role === "organiser" && !unit.archivedAt && unit.state !== "installed" ? (
        <Card title="Change the glazing">
          <p className="mb-3 text-ink-soft">
            A different sheet changes the can grid, the cans this unit needs and its drive&apos;s target. It cannot go below the cans already claimed
            or built in.
          </p>
          <GlazingEditor id={unit.id} plan={plan} cans={unit.cans} held={(summary?.claimed ?? 0) + (summary?.builtIn ?? 0)} />
        </Card>
      ) : null}
    </main>
  );
}
