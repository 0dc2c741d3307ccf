/**
 * A resolved plan as the heater_units columns store it. One mapping for every
 * writer (saving a unit, the demo seed, the tests' fixtures), so each stores
 * every length resolved and none is left to a default on reading. Plain: no
 * database or server import, so the seeds can use it in plain Node.
 */
import type { Tables } from "knex/types/tables";
import { resolveCanGridInput, type CanGridInput } from "./grid-input";

/** The heater_units columns that hold the plan (their row type: types/tables/drives.d.ts). */
export type PlanColumns = Pick<
  Tables["heater_units"],
  | "unit"
  | "coverage"
  | "glazing_width"
  | "glazing_height"
  | "manifold_height"
  | "can_diameter"
  | "can_length"
  | "edge_clearance"
  | "holes_per_can"
  | "frame_allowance_width"
  | "frame_allowance_height"
>;

/** The columns of `plan`, its blanks filled with the defaults in its own unit. */
export function planColumns(plan: CanGridInput): PlanColumns {
  const p = resolveCanGridInput(plan);
  return {
    unit: p.unit,
    coverage: p.coverage,
    glazing_width: p.glazingWidth,
    glazing_height: p.glazingHeight,
    manifold_height: p.manifoldHeight,
    can_diameter: p.canDiameter,
    can_length: p.canLength,
    edge_clearance: p.edgeClearance,
    holes_per_can: p.holesPerCan,
    frame_allowance_width: p.frameAllowanceWidth,
    frame_allowance_height: p.frameAllowanceHeight,
  };
}
