import { route } from "@/lib/api/handler";
import { invalidInput } from "@/lib/api/errors";
import { requireRole } from "@/lib/auth/session";
import { ledgerFilterSchema } from "@/lib/ledger/schemas";
import { exportLedger } from "@/lib/ledger/export";

export const dynamic = "force-dynamic";

export const GET = route(async (req: Request) => {
  const actor = await requireRole("organiser");
  const parsed = ledgerFilterSchema.safeParse(Object.fromEntries(new URL(req.url).searchParams));
  if (!parsed.success) throw invalidInput(parsed.error);
  const { csv, fileName } = await exportLedger(actor.group.id, parsed.data);
  return new Response(csv, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${fileName}"`,
    },
  });
});
