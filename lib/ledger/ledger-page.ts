// The ledger list's paging, free of zod so the screen's client code can import it.

export const TOTAL_HEADER = "x-total-count";
/** Sent instead of the total when more lines match than the count goes to: "more than this many". */
export const TOTAL_OVER_HEADER = "x-total-over";
export const NEXT_CURSOR_HEADER = "x-next-cursor";

/**
 * The first page counts the lines matching its filters up to this many and no
 * further (past it: "more than 1,000 lines"); later pages count nothing. An
 * exact count read all of a busy drive's lines on every view (a million
 * lines: 14 views a second, p95 1.3 s); this one reads at most 1,001 index
 * entries, whatever the group's size.
 */
export const LEDGER_COUNT_CAP = 1_000;

/** GET /api/ledger's page when the request names no `limit`. */
export const LEDGER_PAGE = 500;

/**
 * The ledger screen asks for this many lines at a time; "Load more" fetches the
 * next ones. Every line is a table row with its own undo control, and building
 * hundreds of them at once kept a phone busy for seconds.
 */
export const LEDGER_SCREEN_PAGE = 50;
