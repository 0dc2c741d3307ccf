/**
 * Splits `total` whole cans across items in proportion to `weights` by the
 * largest-remainder method, so the parts are whole and add up exactly. A sort
 * that counted several hauls from different drop points shares its counts
 * out by each haul's estimate, which is all that is known about them.
 */
export function allocate(total: number, weights: readonly number[]): number[] {
  if (!Number.isInteger(total) || total < 0) throw new RangeError("total must be a whole number ≥ 0");
  if (weights.length === 0) return [];
  if (weights.some((w) => !Number.isFinite(w) || w < 0)) throw new RangeError("weights must be finite and ≥ 0");
  const sum = weights.reduce((s, w) => s + w, 0);
  const shares = sum > 0 ? weights.map((w) => (total * w) / sum) : weights.map(() => total / weights.length);
  const parts = shares.map(Math.floor);
  let left = total - parts.reduce((s, p) => s + p, 0);
  // Ties go to the earlier item, so the split is deterministic.
  const order = shares.map((s, i) => ({ i, r: s - Math.floor(s) })).sort((a, b) => b.r - a.r || a.i - b.i);
  for (const { i } of order) {
    if (left <= 0) break;
    parts[i]++;
    left--;
  }
  return parts;
}
