import { calibrationFrom, type Calibration } from "./estimate";

// The group's running sums for the ratio estimators (Σ counted ÷ Σ kg and
// Σ counted ÷ Σ bags), kept in step with sorts and their reversals by
// ledger_sort and ledger_reverse (db/functions/ledger_writers.sql), which add
// calibrationDelta's sums with sign +1 or -1.

/** A group_calibration row (or none yet) as the estimator's sums. */
export function calibrationOfRow(row: Record<string, unknown> | undefined | null): Calibration {
  if (!row || row.weight_hauls === null || row.weight_hauls === undefined) return calibrationFrom([]);
  return {
    weight: { hauls: Number(row.weight_hauls), cans: Number(row.weight_cans), kg: Number(row.weight_kg) },
    bags: { hauls: Number(row.bag_hauls), cans: Number(row.bag_cans), bags: Number(row.bags) },
  };
}

export function calibrationDelta(sort: { counted: number; haulCount: number; bags: number; weightKg: number | null }): Calibration {
  return calibrationFrom([{ hauls: sort.haulCount, counted: sort.counted, bags: sort.bags, weightKg: sort.weightKg }]);
}
