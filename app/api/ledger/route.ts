import { NextResponse } from "next/server";
import { endpoint } from "@/lib/api/endpoint";
import { AppError } from "@/lib/api/errors";
import { LEDGER_PAGE, ledgerListQuerySchema, NEXT_CURSOR_HEADER, TOTAL_HEADER, TOTAL_OVER_HEADER } from "@/lib/ledger/ledger-row";
import { listLedgerPage } from "@/lib/ledger/ledger-list";
import { listMyEntries } from "@/lib/ledger/queries";

export const dynamic = "force-dynamic";

// `?mine=1`: anyone's own recent entries (for undo). Otherwise the group's
// ledger with filters, for organisers: the body stays the array of lines; the
// next page's `cursor` travels in a header, and so, on the first page only,
// does the count: `x-total-count` when up to 1,000 lines match, else
// `x-total-over: 1000` (the count stops there; see LEDGER_COUNT_CAP).
export const GET = endpoint({ who: "member", query: ledgerListQuerySchema }, async ({ actor, query }) => {
  if (query.mine) return listMyEntries(actor.group.id, actor.user.id);
  if (actor.role !== "organiser") throw new AppError("forbidden", "The full ledger is for organisers; add ?mine=1 for your own entries.");
  const page = await listLedgerPage(actor.group.id, query, LEDGER_PAGE);
  const headers: Record<string, string> = {};
  if (page.total !== null) headers[page.totalOver ? TOTAL_OVER_HEADER : TOTAL_HEADER] = String(page.total);
  if (page.nextCursor) headers[NEXT_CURSOR_HEADER] = page.nextCursor;
  return NextResponse.json(page.rows, { headers });
});
