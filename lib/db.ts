import "server-only";
import knex, { type Knex } from "knex";
import { knexConfig } from "@/knexfile";

// One Knex instance per server process, kept on globalThis so development
// reloads do not open a new pool on every edit.
const globalForDb = globalThis as unknown as { cantroveDb?: Knex };

export const db: Knex = globalForDb.cantroveDb ?? knex(knexConfig());
if (process.env.NODE_ENV !== "production") globalForDb.cantroveDb = db;

const UNREACHABLE_CODES = new Set(["ECONNREFUSED", "ECONNRESET", "ETIMEDOUT", "57P01", "57P03", "08006", "08001"]);

/** True for the errors that mean "no database right now", not a bad query. */
export function isDatabaseUnreachable(error: unknown): boolean {
  if (!error || typeof error !== "object") return false;
  const e = error as { code?: string; name?: string; message?: string; errors?: unknown[] };
  if (e.code && UNREACHABLE_CODES.has(e.code)) return true;
  if (e.name === "KnexTimeoutError") return true;
  if (Array.isArray(e.errors) && e.errors.some(isDatabaseUnreachable)) return true;
  return /Connection terminated|connect ECONNREFUSED|the database system is (shutting down|starting up)/i.test(
    e.message ?? "",
  );
}

export async function pingDatabase(timeoutMs = 2_000): Promise<boolean> {
  let timer: NodeJS.Timeout | undefined;
  try {
    await Promise.race([
      db.raw("select 1"),
      new Promise((_, reject) => {
        timer = setTimeout(() => reject(new Error("timeout")), timeoutMs);
      }),
    ]);
    return true;
  } catch {
    return false;
  } finally {
    clearTimeout(timer);
  }
}
