// The volunteer's outbox: entries wait in localStorage until the server
// acknowledges them, and every retry sends the same Idempotency-Key, so a
// request that reached the server but lost its answer is never recorded twice.
// Pure helpers over a storage-like object, so they are testable without a browser.

import { countOf } from "@/lib/plural";

export interface OutboxItem {
  key: string;
  url: string;
  body: unknown;
  label: string;
  createdAt: string;
  attempts: number;
  lastError?: string;
}

export interface StorageLike {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
}

export const OUTBOX_STORAGE_KEY = "cantrove.outbox.v1";

export function readOutbox(storage: StorageLike): OutboxItem[] {
  try {
    const parsed = JSON.parse(storage.getItem(OUTBOX_STORAGE_KEY) ?? "[]");
    return Array.isArray(parsed) ? parsed : [];
  } catch {
    return [];
  }
}

export function writeOutbox(storage: StorageLike, items: OutboxItem[]): void {
  storage.setItem(OUTBOX_STORAGE_KEY, JSON.stringify(items));
}

export function addToOutbox(storage: StorageLike, item: OutboxItem): OutboxItem[] {
  const items = readOutbox(storage).filter((i) => i.key !== item.key);
  items.push(item);
  writeOutbox(storage, items);
  return items;
}

export function removeFromOutbox(storage: StorageLike, key: string): OutboxItem[] {
  const items = readOutbox(storage).filter((i) => i.key !== key);
  writeOutbox(storage, items);
  return items;
}

export function markAttempt(storage: StorageLike, key: string, error: string): OutboxItem[] {
  const items = readOutbox(storage).map((i) => (i.key === key ? { ...i, attempts: i.attempts + 1, lastError: error } : i));
  writeOutbox(storage, items);
  return items;
}

/**
 * A new entry, stamped with the time it was entered: the body carries it as
 * `happenedAt`, so the server records when it happened, not when the queue
 * got through. Stamped once, here, so every retry sends the same body under
 * the same key (a different body under a used key is refused).
 */
export function newOutboxItem(url: string, body: unknown, label: string, now: Date, key: string): OutboxItem {
  const createdAt = now.toISOString();
  const stamped = body && typeof body === "object" && !Array.isArray(body) ? { happenedAt: createdAt, ...(body as Record<string, unknown>) } : body;
  return { key, url, body: stamped, label, createdAt, attempts: 0 };
}

/**
 * The same entry sent again after the person said an unusual number is right:
 * `confirmUnusual: true`, the time it was first entered, and a NEW key — the
 * refusal is stored under the old key, which would only replay it.
 */
export function confirmedCopy(item: OutboxItem, key: string): OutboxItem {
  return { ...item, key, body: { ...(item.body as Record<string, unknown>), confirmUnusual: true }, attempts: 0, lastError: undefined };
}

export type SendOutcome =
  | { kind: "done"; status: number; body: unknown }
  | { kind: "refused"; status: number; message: string; fields?: Record<string, string>; question?: string }
  | { kind: "retry"; message: string };

/**
 * What to do with one answer: 2xx is done; a 4xx (other than 408/429) is the
 * server's considered refusal and will not change on retry; anything else —
 * no network, a 5xx, a timeout — waits for the next try.
 */
// Why an entry is still waiting, in words a volunteer understands: the browser's
// own text ("Failed to fetch", "Load failed", "NetworkError…") differs by browser and says nothing.
export const NO_CONNECTION = "no connection yet";
export const SERVER_BUSY = "the server did not answer";

export function classify(status: number | null, body: unknown, _networkError?: string): SendOutcome {
  if (status === null) return { kind: "retry", message: NO_CONNECTION };
  if (status >= 200 && status < 300) return { kind: "done", status, body };
  if (status >= 400 && status < 500 && status !== 408 && status !== 429) {
    const error = (body as { error?: { message?: string; fields?: Record<string, string>; confirm?: string } } | null)?.error;
    const message = error?.message ?? `Refused (${status})`;
    // The server's question about an unusual number: the person answers it, then the entry goes again confirmed.
    const question = status === 409 && error?.confirm === "implausible" ? message : undefined;
    return { kind: "refused", status, message, ...(error?.fields ? { fields: error.fields } : {}), ...(question ? { question } : {}) };
  }
  return { kind: "retry", message: SERVER_BUSY };
}

/** "Tried 4 times, no connection yet": what the waiting list says under an entry (older items kept the browser's text). */
export function attemptsText(attempts: number, lastError?: string): string {
  const why = lastError === SERVER_BUSY ? SERVER_BUSY : NO_CONNECTION;
  return `Tried ${countOf(attempts, "time")}, ${why}. It is sent by itself once it can be.`;
}
