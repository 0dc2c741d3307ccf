import type { Knex } from "knex";

// A saved heater unit keeps the can size, manifold height, edge clearance and
// frame allowances it was planned with. Until now a blank one stayed NULL and
// the default was filled in on every read, so changing a default in code would
// have redrawn saved units' grids, materials and build sheets (and the next
// glazing change would have counted cans with the new default).
//
// Every NULL is filled with exactly what the read path resolved it to on the
// day of this migration: the default in millimetres, in the unit the plan was
// saved in (inches: millimetres / 25.4, float8 division as in the planner's
// code). The values are written out here on purpose: a later change of the
// defaults in lib/heaters/grid-input.ts must not change what this did. `cans`,
// `columns` and `rows` are not touched, so no unit's count and no drive's
// target moves.
const DEFAULTS_MM = {
  can_diameter: 66,
  can_length: 122,
  manifold_height: 127,
  edge_clearance: 0,
  frame_allowance_width: 0,
  frame_allowance_height: 0,
} as const;
const MM_PER_INCH = 25.4;

const COLUMNS = Object.keys(DEFAULTS_MM) as (keyof typeof DEFAULTS_MM)[];

export async function up(knex: Knex): Promise<void> {
  const sets = COLUMNS.map(
    (c) => `${c} = coalesce(${c}, case unit when 'in' then ?::float8 / ?::float8 else ?::float8 end)`,
  ).join(",\n    ");
  const bindings = COLUMNS.flatMap((c) => [DEFAULTS_MM[c], MM_PER_INCH, DEFAULTS_MM[c]]);
  await knex.raw(
    `update heater_units set\n    ${sets}\n  where ${COLUMNS.map((c) => `${c} is null`).join(" or ")}`,
    bindings,
  );
  await knex.raw(`alter table heater_units ${COLUMNS.map((c) => `alter column ${c} set not null`).join(", ")}`);
}

// The values stay; only the columns accept NULL again.
export async function down(knex: Knex): Promise<void> {
  await knex.raw(`alter table heater_units ${COLUMNS.map((c) => `alter column ${c} drop not null`).join(", ")}`);
}
