// The ledger list's paging, free of zod so the screen's client code can import it.

export const TOTAL_HEADER = "x-total-count";
export const NEXT_CURSOR_HEADER = "x-next-cursor";

/** GET /api/ledger's page when the request names no `limit`. */
export const LEDGER_PAGE = 500;

/**
 * The ledger screen asks for this many lines at a time; "Load more" fetches the
 * next ones. Every line is a table row with its own undo control, and building
 * hundreds of them at once kept a phone busy for seconds.
 */
export const LEDGER_SCREEN_PAGE = 50;
