import type { Tables } from "knex/types/tables";
import { calibrationFrom, type Calibration } from "./estimate";

// The group's running sums for the ratio estimators (Σ counted ÷ Σ kg and
// Σ counted ÷ Σ bags), kept in step with sorts and their reversals by
// ledger_sort and ledger_reverse (db/functions/ledger_writers.sql), which add
// calibrationDelta's sums with sign +1 or -1.

type CalibrationRow = Pick<Tables["group_calibration"], "weight_hauls" | "weight_cans" | "weight_kg" | "bag_hauls" | "bag_cans" | "bags">;

/** A group_calibration row (or none yet: no row, or a left join's nulls) as the estimator's sums. */
export function calibrationOfRow(row: CalibrationRow | { [K in keyof CalibrationRow]: null } | undefined | null): Calibration {
  if (!row || row.weight_hauls === null) return calibrationFrom([]);
  return {
    weight: { hauls: row.weight_hauls, cans: row.weight_cans, kg: row.weight_kg },
    bags: { hauls: row.bag_hauls, cans: row.bag_cans, bags: row.bags },
  };
}

export function calibrationDelta(sort: { counted: number; haulCount: number; bags: number; weightKg: number | null }): Calibration {
  return calibrationFrom([{ hauls: sort.haulCount, counted: sort.counted, bags: sort.bags, weightKg: sort.weightKg }]);
}
