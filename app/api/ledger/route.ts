import { endpoint } from "@/lib/api/endpoint";
import { AppError } from "@/lib/api/errors";
import { ledgerFilterSchema } from "@/lib/ledger/schemas";
import { listLedger, listMyEntries } from "@/lib/ledger/queries";

export const dynamic = "force-dynamic";

// `?mine=1`: anyone's own recent entries (for undo). Otherwise the group's
// ledger with filters, for organisers.
export const GET = endpoint({ who: "member", query: ledgerFilterSchema }, async ({ actor, query }) => {
  if (query.mine) return listMyEntries(actor.group.id, actor.user.id);
  if (actor.role !== "organiser") throw new AppError("forbidden", "The full ledger is for organisers; add ?mine=1 for your own entries.");
  return listLedger(actor.group.id, query);
});
