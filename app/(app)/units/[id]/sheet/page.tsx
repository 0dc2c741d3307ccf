import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { GridFigures } from "@/components/heaters/grid-figures";
import { GridDimensions } from "@/components/heaters/grid-dimensions";
import { MaterialsTable } from "@/components/heaters/materials-table";
import { PrintButton } from "@/components/heaters/print-button";
import { AppError } from "@/lib/api/errors";
import { requirePageRole } from "@/lib/auth/session";
import { buildSteps } from "@/lib/heaters/build-steps";
import { computeCanGrid } from "@/lib/heaters/can-grid";
import { formatLength } from "@/lib/heaters/format";
import { formatMoment } from "@/lib/format/dates";
import { groupLook } from "@/lib/format/group-look-queries";
import { lengthUnitOf } from "@/lib/format/measures";
import { computeMaterials } from "@/lib/heaters/materials";
import { getHeaterUnit, planOf } from "@/lib/heaters/queries";
import { HEATER_STATE_LABEL } from "@/lib/heaters/unit-schemas";
import { unitNeed } from "@/lib/heaters/need";
import { listHeatersWithClaims } from "@/lib/heaters/queries";
import { UnitFigures } from "@/components/heaters/unit-figures";

export const metadata: Metadata = { title: "Build sheet" };

type Props = { params: Promise<{ id: string }> };

export default async function BuildSheetPage({ params }: Props) {
  const { id } = await params;
  const actor = await requirePageRole(`/units/${id}/sheet`, "builder", "organiser");
  const unit = await getHeaterUnit(actor.group.id, id).catch((e) => {
    if (e instanceof AppError && e.code === "not_found") notFound();
    throw e;
  });
  // Lengths in the group's units, whatever unit the plan was saved in; the time on the group's clock.
  const look = await groupLook(actor.group.id);
  const plan = planOf(unit, lengthUnitOf(look.units));
  const grid = computeCanGrid(plan);
  const materials = computeMaterials(plan);
  const steps = buildSteps({ ...grid, holesPerCan: plan.holesPerCan });
  // The same figures as the unit page, as they stand when the sheet is printed.
  const summary = (await listHeatersWithClaims(actor.group.id)).find((u) => u.id === unit.id);
  const counts = summary ?? { ...unitNeed(unit.cans, unit.spare, 0, 0), claimed: 0, builtIn: 0 };
  const printedAt = formatMoment(new Date(), look);
  return (
    <main className="build-sheet flex flex-col gap-5 print:gap-3">
      <div className="no-print flex flex-wrap items-center justify-between gap-3">
        <Link href={`/units/${unit.id}`} className="tap">← Back to the unit</Link>
        <PrintButton />
      </div>
      <header>
        <h1 className="text-3xl">Build sheet: {unit.name}</h1>
        <p className="text-ink-soft">
          {actor.group.name}
          {unit.driveName ? ` · ${unit.driveName}` : ""} · {HEATER_STATE_LABEL[unit.state]} · glazing {formatLength(plan.glazingWidth, plan.unit, look)} ×{" "}
          {formatLength(plan.glazingHeight, plan.unit, look)} ({unit.coverage === "full" ? "chamber and manifolds" : "chamber only"})
        </p>
      </header>

      {/* Figures and live counts beside the drawing, so materials still fit on page 1 of A4 or Letter. */}
      <div className="grid gap-4 md:grid-cols-[1fr_20rem] print:grid-cols-[1fr_85mm]">
        <div className="flex flex-col gap-4">
          <section className="break-inside-avoid">
            <h2 className="mb-2 text-xl">Can grid</h2>
            <GridFigures grid={grid} />
          </section>
          <section className="break-inside-avoid" data-testid="sheet-cans">
            <h2 className="mb-2 text-xl">Cans for this unit</h2>
            <UnitFigures c={counts} printedAt={printedAt} />
          </section>
        </div>
        <GridDimensions plan={plan} grid={grid} />
      </div>

      <section className="break-inside-avoid">
        <h2 className="mb-2 text-xl">Materials</h2>
        <MaterialsTable list={materials} />
      </section>

      <section className="print:break-before-page">
        <h2 className="mb-2 text-xl">Build steps</h2>
        <ol className="flex list-decimal flex-col gap-3 pl-6">
          {steps.map((s) => (
            <li key={s.title} className="break-inside-avoid">
              <p className="font-bold">{s.title}</p>
              <p>{s.text}</p>
              {s.caution ? (
                <p className="mt-1 border-l-4 border-sun bg-sun-soft px-3 py-1 font-semibold">Caution: {s.caution}</p>
              ) : null}
            </li>
          ))}
        </ol>
      </section>
      <p className="break-inside-avoid border-l-4 border-sun bg-sun-soft px-3 py-2 text-sm font-semibold" data-testid="sheet-safety">
        Work safely: cut can edges are sharp (gloves on, offcuts in a closed bin); use tools as their makers say, with eye and hearing
        protection; the absorber, glazing and outlet get hot enough to burn in sun, so let a heater cool or cover it before working on it.
        The heat figures of the planner are estimates. Local building codes and licensed trades have the last word on wiring and wall
        openings.
      </p>
    </main>
  );
}
