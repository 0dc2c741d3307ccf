import "server-only";
import knex, { type Knex } from "knex";
import { knexConfig } from "@/knexfile";

// One Knex instance (one pool) per server process, kept on globalThis: the
// server loads this module once per route bundle (pages and route handlers are
// bundled apart), and development reloads it on every edit.
const globalForDb = globalThis as unknown as { cantroveDb?: Knex };

export const db: Knex = (globalForDb.cantroveDb ??= knex(knexConfig()));

export { isDatabaseUnreachable } from "./db-errors";

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
