import "server-only";
import { db } from "@/lib/db";
import { notFound } from "@/lib/api/errors";

// The naive way, kept only as the benchmark's reference: every request sums
// the drive's whole ledger instead of reading the running totals.
export function benchRoutesEnabled(): boolean {
  return process.env.CANTROVE_BENCH === "1";
}

export async function naiveStock(groupId: string, driveId: string) {
  const drive = await db("drives").select("id").where({ id: driveId, group_id: groupId }).first();
  if (!drive) throw notFound("That drive");
  const { rows } = await db.raw(
    `select stage, sum(q)::bigint as quantity from (
       select to_stage as stage, quantity as q from ledger_lines where drive_id = ? and to_stage is not null
       union all
       select from_stage, -quantity from ledger_lines where drive_id = ? and from_stage is not null
     ) m group by stage`,
    [driveId, driveId],
  );
  const t = Object.fromEntries((rows as { stage: string; quantity: number }[]).map((r) => [r.stage, r.quantity]));
  const of = (s: string) => t[s] ?? 0;
  const claimed = of("claimed");
  return {
    stages: { hauled: of("hauled"), good: of("good"), washed: of("washed"), opened: of("opened"), punched: of("punched"), builtIn: of("builtIn"), recycled: of("recycled") },
    claimed,
    unclaimed: of("good") + of("washed") + of("opened") + of("punched") - claimed,
  };
}
