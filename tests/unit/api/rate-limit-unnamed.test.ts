import { describe, expect, it, vi } from "vitest";

// Behind PgBouncer in transaction mode (1.18) a named prepared statement made on
// one server connection is unknown on the next (PgBouncer's documentation,
// "Features" table: protocol-level prepared plans are not supported in
// transaction pooling before 1.21). The limiter must send every query unnamed.
const sent: { name?: string; text: string }[] = [];
const conn = {
  query: async (q: { name?: string; text: string }) => {
    sent.push(q);
    return { rowCount: 1, rows: [{ points: 1, expire: Date.now() + 60_000 }] };
  },
};
vi.mock("@/lib/db", () => ({
  db: { client: { acquireConnection: async () => conn, releaseConnection: () => true } },
}));

describe("rate limiter behind a transaction-mode pooler", () => {
  it("names no prepared statement", async () => {
    const { limiterFor } = await import("@/lib/api/rate-limit-store");
    const limiter = limiterFor({ name: "unnamed-check", points: 5, durationSec: 60 });
    await limiter.consume("someone");
    await limiter.get("someone");
    expect(sent.length).toBeGreaterThanOrEqual(2);
    expect(sent.every((q) => q.name === undefined)).toBe(true);
    expect(sent.some((q) => /INSERT INTO/.test(q.text))).toBe(true);
  });
});
