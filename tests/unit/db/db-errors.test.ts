import { describe, expect, it } from "vitest";
import { isDatabaseUnreachable } from "@/lib/db-errors";

// The shapes a lost database takes by the time it reaches a handler. Messages
// are node-postgres's and Knex's own (node_modules/pg/lib/client.js,
// node_modules/knex/lib/dialects/postgres/index.js); SQLSTATEs from the
// PostgreSQL 15 manual, Appendix A (class 08 and 57P).
const pgError = (message: string, code: string) => Object.assign(new Error(message), { code, severity: "FATAL" });

describe("isDatabaseUnreachable", () => {
  it.each([
    ["pg: socket closed mid-query", new Error("Connection terminated unexpectedly")],
    ["pg: client ended", new Error("Connection terminated")],
    ["pg-pool: connect timeout", new Error("Connection terminated due to connection timeout")],
    ["knex: a connection's end, as Knex records it (a bare string)", "Connection ended unexpectedly"],
    ["knex: a transaction rejected with that string", new Error("Transaction rejected with non-error: Connection ended unexpectedly")],
    ["pg: the client after a connection error", new Error("Client has encountered a connection error and is not queryable")],
    ["socket reset", Object.assign(new Error("read ECONNRESET"), { code: "ECONNRESET", errno: -104, syscall: "read" })],
    ["socket refused", Object.assign(new Error("connect ECONNREFUSED 127.0.0.1:5432"), { code: "ECONNREFUSED" })],
    ["broken pipe", Object.assign(new Error("write EPIPE"), { code: "EPIPE" })],
    ["57P01 admin_shutdown", pgError("terminating connection due to administrator command", "57P01")],
    ["57P02 crash_shutdown", pgError("terminating connection because of crash of another server process", "57P02")],
    ["57P03 cannot_connect_now", pgError("the database system is starting up", "57P03")],
    ["08006 connection_failure", pgError("connection failure", "08006")],
    ["08003 connection_does_not_exist", pgError("connection does not exist", "08003")],
    ["08001 unable to connect", pgError("could not connect to server", "08001")],
    ["the admin-shutdown message without its code", new Error("terminating connection due to administrator command")],
    ["Knex's pool timeout", Object.assign(new Error("Knex: Timeout acquiring a connection. The pool is probably full."), { name: "KnexTimeoutError" })],
    ["a wrapped cause", new Error("query failed", { cause: pgError("terminating connection due to administrator command", "57P01") })],
    ["an AggregateError of refused addresses", new AggregateError([Object.assign(new Error("connect ECONNREFUSED ::1:5432"), { code: "ECONNREFUSED" })], "")],
  ])("%s → unreachable", (_what, error) => {
    expect(isDatabaseUnreachable(error)).toBe(true);
  });

  it.each([
    ["a unique violation", pgError('duplicate key value violates unique constraint "x"', "23505")],
    ["a check violation", pgError('new row violates check constraint "x"', "23514")],
    ["a statement timeout (the query, not the server)", pgError("canceling statement due to statement timeout", "57014")],
    ["a bad uuid", pgError('invalid input syntax for type uuid: "x"', "22P02")],
    ["a plain bug", new TypeError("Cannot read properties of undefined (reading 'id')")],
    ["nothing", undefined],
    ["a number", 42],
    ["an unrelated string", "something else"],
  ])("%s → not unreachable", (_what, error) => {
    expect(isDatabaseUnreachable(error)).toBe(false);
  });

  it("stops at a cycle of causes", () => {
    const a = new Error("a");
    const b = new Error("b", { cause: a });
    (a as Error & { cause?: unknown }).cause = b;
    expect(isDatabaseUnreachable(a)).toBe(false);
  });
});
