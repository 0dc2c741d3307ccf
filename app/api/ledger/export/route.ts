import { stringify } from "csv-stringify/sync";
import { route } from "@/lib/api/handler";
import { invalidInput } from "@/lib/api/errors";
import { requireRole } from "@/lib/auth/session";
import { ledgerFilterSchema } from "@/lib/ledger/schemas";
import { listLedger } from "@/lib/ledger/queries";
import { LEDGER_CSV_COLUMNS } from "@/lib/ledger/csv";

export const dynamic = "force-dynamic";

export const GET = route(async (req: Request) => {
  const actor = await requireRole("organiser");
  const parsed = ledgerFilterSchema.safeParse(Object.fromEntries(new URL(req.url).searchParams));
  if (!parsed.success) throw invalidInput(parsed.error);
  const rows = await listLedger(actor.group.id, { ...parsed.data, limit: undefined }, 100_000);
  const csv = stringify(rows, { header: true, columns: LEDGER_CSV_COLUMNS, cast: { boolean: (v) => (v ? "yes" : "no") } });
  return new Response(csv, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="ledger-${new Date().toISOString().slice(0, 10)}.csv"`,
    },
  });
});
