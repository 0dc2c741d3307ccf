import { stringify } from "csv-stringify/sync";
import { endpoint } from "@/lib/api/endpoint";
import { ledgerFilterSchema } from "@/lib/ledger/schemas";
import { listLedger } from "@/lib/ledger/queries";
import { LEDGER_CSV_COLUMNS } from "@/lib/ledger/csv";

export const dynamic = "force-dynamic";

export const GET = endpoint({ who: ["organiser"], query: ledgerFilterSchema }, async ({ actor, query }) => {
  const rows = await listLedger(actor.group.id, { ...query, limit: undefined }, 100_000);
  const csv = stringify(rows, { header: true, columns: LEDGER_CSV_COLUMNS, cast: { boolean: (v) => (v ? "yes" : "no") } });
  return new Response(csv, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="ledger-${new Date().toISOString().slice(0, 10)}.csv"`,
    },
  });
});
