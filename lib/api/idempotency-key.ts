/**
 * A fresh Idempotency-Key for one write from the browser (the rule: lib/api/idempotency.ts).
 * crypto.randomUUID exists only in a secure context; on plain HTTP (a preview on the
 * local network) the key is 128 random bits in hex, just as hard to guess.
 * Safe to import in the client.
 */
export function newKey(): string {
  if (typeof crypto.randomUUID === "function") return crypto.randomUUID();
  return Array.from(crypto.getRandomValues(new Uint8Array(16)), (b) => b.toString(16).padStart(2, "0")).join("");
}
