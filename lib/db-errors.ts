/**
 * Which errors mean "no database right now" (answer 503 database_unavailable,
 * so a client retries) rather than "this query is wrong" (a 500 or a mapped
 * refusal). Pure, so it is tested without a database.
 */

// Node socket errors, and PostgreSQL SQLSTATEs of class 08 (connection
// exception) and 57P (operator intervention), as listed in Appendix A of the
// PostgreSQL 15 manual: 57P01 admin_shutdown, 57P02 crash_shutdown,
// 57P03 cannot_connect_now, 08000 connection_exception, 08001 / 08004 the
// client / server refused to connect, 08003 connection_does_not_exist,
// 08006 connection_failure.
const UNREACHABLE_CODES = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "ECONNABORTED",
  "EPIPE",
  "ETIMEDOUT",
  "EHOSTUNREACH",
  "ENETUNREACH",
  "57P01",
  "57P02",
  "57P03",
  "08000",
  "08001",
  "08003",
  "08004",
  "08006",
]);

// Messages of node-postgres (pg/lib/client.js), pg-pool and Knex's postgres
// dialect when the server goes away mid-query or mid-transaction; Knex also
// wraps a rejected transaction as "Transaction rejected with non-error: …".
const UNREACHABLE_MESSAGE =
  /Connection terminated|Connection ended unexpectedly|connect ECONNREFUSED|read ECONNRESET|write EPIPE|not queryable|terminating connection due to administrator command|the database system is (shutting down|starting up|in recovery mode)|server closed the connection unexpectedly|Timeout acquiring a connection/i;

/** True for the errors that mean "no database right now", not a bad query. */
export function isDatabaseUnreachable(error: unknown, depth = 0): boolean {
  if (depth > 5 || error == null) return false;
  // Knex records a connection's end as a bare string and may reject with it.
  if (typeof error === "string") return UNREACHABLE_MESSAGE.test(error);
  if (typeof error !== "object") return false;
  const e = error as { code?: unknown; name?: unknown; message?: unknown; errors?: unknown; cause?: unknown };
  if (typeof e.code === "string" && UNREACHABLE_CODES.has(e.code)) return true;
  if (e.name === "KnexTimeoutError") return true;
  if (typeof e.message === "string" && UNREACHABLE_MESSAGE.test(e.message)) return true;
  if (Array.isArray(e.errors) && e.errors.some((inner) => isDatabaseUnreachable(inner, depth + 1))) return true;
  return isDatabaseUnreachable(e.cause, depth + 1);
}
