import type { Knex } from "knex";
import { calibrationFrom, type Calibration } from "./estimate";

// The group's running sums for the ratio estimators (Σ counted ÷ Σ kg and
// Σ counted ÷ Σ bags), kept in step with sorts and their reversals.

export async function loadCalibration(conn: Knex | Knex.Transaction, groupId: string): Promise<Calibration> {
  const row = await conn("group_calibration").where({ group_id: groupId }).first();
  if (!row) return calibrationFrom([]);
  return {
    weight: { hauls: Number(row.weight_hauls), cans: Number(row.weight_cans), kg: Number(row.weight_kg) },
    bags: { hauls: Number(row.bag_hauls), cans: Number(row.bag_cans), bags: Number(row.bags) },
  };
}

export function calibrationDelta(sort: { counted: number; haulCount: number; bags: number; weightKg: number | null }): Calibration {
  return calibrationFrom([{ hauls: sort.haulCount, counted: sort.counted, bags: sort.bags, weightKg: sort.weightKg }]);
}

export async function applyCalibration(trx: Knex.Transaction, groupId: string, d: Calibration, sign: 1 | -1): Promise<void> {
  await trx.raw("insert into group_calibration (group_id) values (?) on conflict (group_id) do nothing", [groupId]);
  await trx("group_calibration")
    .where({ group_id: groupId })
    .update({
      weight_hauls: trx.raw("weight_hauls + ?", [sign * d.weight.hauls]),
      weight_cans: trx.raw("weight_cans + ?", [sign * d.weight.cans]),
      weight_kg: trx.raw("weight_kg + ?", [sign * d.weight.kg]),
      bag_hauls: trx.raw("bag_hauls + ?", [sign * d.bags.hauls]),
      bag_cans: trx.raw("bag_cans + ?", [sign * d.bags.cans]),
      bags: trx.raw("bags + ?", [sign * d.bags.bags]),
    });
}
