// One line of the ledger as GET /api/ledger answers it and the CSV writes it. Safe in the client.
import { z } from "zod";
import { ledgerFilterSchema } from "./schemas";
export interface LedgerRow {
  id: string;
  movementId: string;
  kind: string;
  occurredAt: string;
  recordedAt: string;
  person: string;
  personId: string;
  drive: string;
  driveId: string;
  dropPoint: string | null;
  heaterUnit: string | null;
  from: string | null;
  to: string | null;
  quantity: number;
  reason: string | null;
  isEstimate: boolean;
  reversesId: string | null;
  note: string;
  /** The line that undoes this one, when its movement was undone. */
  reversedById: string | null;
  /** On an undo: why the organiser undid the entry, as they wrote it. */
  reversalReason: string | null;
}

/** A page of the ledger: GET /api/ledger sends the rows as its body and these in headers. */
export interface LedgerPage {
  rows: LedgerRow[];
  /**
   * How many lines match the filters, counted on the first page only (null on
   * the pages after it): exact up to LEDGER_COUNT_CAP; past it the cap itself,
   * with `totalOver` set.
   */
  total: number | null;
  /** More than `total` lines match (the count stopped at the cap). */
  totalOver: boolean;
  nextCursor: string | null;
}

export { LEDGER_COUNT_CAP, LEDGER_PAGE, NEXT_CURSOR_HEADER, TOTAL_HEADER, TOTAL_OVER_HEADER } from "./ledger-page";

/** The ledger list's query: the shared filters plus the cursor of "Load more" (the last line shown). */
export const ledgerListQuerySchema = ledgerFilterSchema.extend({
  cursor: z.string().regex(/^\d{1,18}$/, "The cursor is the line number of the last line shown.").optional(),
});
export type LedgerListQuery = z.infer<typeof ledgerListQuerySchema>;
