// Sends one person's waiting entries, oldest first, each with its own
// Idempotency-Key and its owner (X-Cantrove-Entered-By). Used by the pages
// (on load, every few seconds, on "online") and by the service worker (on
// Background Sync). A Web Lock keeps two of them from sending at once; the
// key would make a double send harmless anyway.

import { classify, type SendOutcome } from "@/lib/ledger/browser-queue";
import { deleteEntry, entriesOf, putEntry, type QueuedEntry } from "./store";

export const OUTBOX_LOCK = "cantrove-outbox";
export const SYNC_TAG = "cantrove-outbox";

export async function sendEntry(entry: QueuedEntry): Promise<SendOutcome> {
  let res: Response;
  try {
    res = await fetch(entry.url, {
      method: "POST",
      credentials: "same-origin",
      headers: { "content-type": "application/json", accept: "application/json", "idempotency-key": entry.key, "x-cantrove-entered-by": entry.owner },
      body: JSON.stringify(entry.body),
    });
  } catch {
    return classify(null, null);
  }
  let body: unknown = null;
  try {
    body = await res.json();
  } catch {
    body = null;
  }
  return classify(res.status, body);
}

/** What one answer does to the stored entry; returns the outcome. */
export async function settle(entry: QueuedEntry, outcome: SendOutcome): Promise<void> {
  if (outcome.kind === "done") await deleteEntry(entry.key);
  else if (outcome.kind === "retry") await putEntry({ ...entry, attempts: entry.attempts + 1, lastError: outcome.message });
  else
    await putEntry({
      ...entry,
      state: "refused",
      refusal: { status: outcome.status, message: outcome.message, ...(outcome.question ? { question: outcome.question } : {}), ...(outcome.fields ? { fields: outcome.fields } : {}) },
    });
}

async function withLock<T>(work: () => Promise<T>): Promise<T | null> {
  const locks = (globalThis.navigator as Navigator | undefined)?.locks;
  if (!locks) return work();
  // ifAvailable: whoever holds it is already sending; nothing to do twice.
  return locks.request(OUTBOX_LOCK, { ifAvailable: true }, async (lock) => (lock ? work() : null));
}

/**
 * Sends the owner's waiting entries in order and stops at the first that must
 * wait (no connection, server busy): a later entry may depend on it. Returns
 * how many were settled (done or refused), or null when another sender had the lock.
 */
export async function flushOwner(owner: string, group?: string): Promise<{ settled: number; left: number } | null> {
  return withLock(async () => {
    let settled = 0;
    const waiting = (await entriesOf(owner, group)).filter((e) => e.state === "waiting");
    for (const entry of waiting) {
      const outcome = await sendEntry(entry);
      await settle(entry, outcome);
      if (outcome.kind === "retry") return { settled, left: waiting.length - settled };
      settled += 1;
    }
    return { settled, left: 0 };
  });
}
