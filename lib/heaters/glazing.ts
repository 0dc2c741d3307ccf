import "server-only";
import { AppError, conflict } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/queries";
import { db } from "@/lib/db";
import { ledgerCall, runLedgerFunction, type OwnRefusals } from "@/lib/ledger/post";
import { countOf } from "@/lib/plural";
import { computeCanGrid } from "./can-grid";
import type { CanGridInput } from "./schemas";
import { formatNumber } from "./format";
import { getHeaterUnit, planOf, type HeaterUnitRow } from "./queries";

const cans = (n: number) => countOf(n, "can", formatNumber);

const REFUSALS: OwnRefusals = {
  unitMoved: () => conflict("The unit moved to another drive meanwhile; reload and try again."),
  unitInstalled: () => conflict("This heater is on the wall: its glazing is what was built and can no longer change."),
  belowClaims: (d) => {
    const [grid, spare, claimed, builtIn] = [Number(d.cans), Number(d.spare), Number(d.claimed), Number(d.builtIn)];
    const held = claimed + builtIn;
    return conflict(
      `The new glazing holds ${cans(grid)} (${cans(grid + spare)} with the spare), but ${cans(held)} are already claimed or built into this unit. ` +
        "Release claimed cans first, or choose a larger glazing.",
      { cans: grid, spare, claimed, builtIn },
    );
  },
};

/**
 * A unit's new glazing (issue 16). The grid is recomputed here from the plan, never taken from the
 * client; heater_unit_glazing (db/functions/heater_unit_archive.sql) locks the drive and the unit and
 * refuses (409) a grid whose need falls below what is claimed and built in, or an installed unit. The
 * drive's target is Σ cans of its units, so it follows at once.
 */
export async function changeGlazing(actor: Actor, unit: HeaterUnitRow, given: CanGridInput): Promise<HeaterUnitRow & { was: number }> {
  // What the new plan leaves out keeps the unit's own saved value (in the unit the plan is sent in).
  const sent = Object.fromEntries(Object.entries(given).filter(([, v]) => v !== undefined));
  const plan: Required<CanGridInput> = { ...planOf(unit, given.unit), ...sent };
  const grid = computeCanGrid(plan);
  if (grid.cans < 1) {
    const why = "This sheet is too small to hold one column and one row of cans.";
    throw new AppError("invalid_input", `${why} Choose a larger glazing.`, { fields: { "plan.glazingWidth": why, "plan.glazingHeight": why } });
  }
  const payload = {
    groupId: actor.group.id,
    driveId: unit.driveId,
    unit: { id: unit.id },
    plan: { ...plan, columns: grid.columns, rows: grid.rows, cans: grid.cans },
  };
  const r = await runLedgerFunction<{ was: number }>(db, ledgerCall("heater_unit_glazing", payload), REFUSALS);
  return { ...(await getHeaterUnit(actor.group.id, unit.id)), was: Number(r.was) };
}
