import { endpoint } from "@/lib/api/endpoint";
import { ledgerFilterSchema } from "@/lib/ledger/schemas";
import { exportLedger } from "@/lib/ledger/export";

export const dynamic = "force-dynamic";

export const GET = endpoint({ who: ["organiser"], query: ledgerFilterSchema }, async ({ actor, query }) => {
  const { csv, fileName } = await exportLedger(actor.group.id, query);
  return new Response(csv, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${fileName}"`,
    },
  });
});
