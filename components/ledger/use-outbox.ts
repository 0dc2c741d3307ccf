"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useCallback, useEffect, useRef, useState } from "react";
import { confirmedCopy, newOutboxItem, OUTBOX_STORAGE_KEY, readOutbox, type OutboxItem, type SendOutcome } from "@/lib/ledger/browser-queue";
import { useLedgerChanged } from "@/hooks/queries/ledger";
import { usePersonGroup, usePersonId } from "@/components/offline/person-context";
import { deleteEntry, entriesOf, putEntry, type QueuedEntry } from "@/lib/offline/store";
import { flushOwner, sendEntry, settle, SYNC_TAG } from "@/lib/offline/send";
import { correctedCopy } from "@/lib/offline/fix";
import { newKey } from "@/lib/api/idempotency-key";

export type SubmitResult =
  | { kind: "done"; body: unknown }
  /** `question` and `confirm` when the server asks about an unusual number: `confirm()` sends it again, confirmed. */
  | { kind: "refused"; message: string; fields?: Record<string, string>; question?: string; confirm?: () => Promise<SubmitResult> }
  | { kind: "queued"; message: string };

/** An entry the server refused after it waited on the phone: kept (in IndexedDB) until fixed or dropped. */
export interface Refusal {
  key: string;
  label: string;
  message: string;
  question?: string;
  /** The server's word on each field it refused, where it named them. */
  fields?: Record<string, string>;
  item: OutboxItem;
}

const RETRY_MS = 4_000;

/** Asks the browser to send the queue when the signal returns, even with the page closed (Background Sync, where there is one). */
async function askForSync(): Promise<void> {
  try {
    // Only with no signal: while online the page itself retries every few seconds (a failed try
    // then is the server's trouble, not the phone's), and the next visit sends what is left.
    if (!("serviceWorker" in navigator) || navigator.onLine) return;
    const reg = (await Promise.race([navigator.serviceWorker.ready, new Promise((r) => setTimeout(r, 500))])) as ServiceWorkerRegistration | undefined;
    const sync = (reg as (ServiceWorkerRegistration & { sync?: { register(tag: string): Promise<void> } }) | undefined)?.sync;
    await sync?.register(SYNC_TAG);
  } catch {
    // no Background Sync here: the queue goes on the next visit (and every few seconds while open)
  }
}

/**
 * Entries go to IndexedDB first (lib/offline/store.ts), under the signed-in
 * person, then to the server in order; unacknowledged ones are retried with the
 * same Idempotency-Key. `stopId` marks an entry made at a run's stop.
 */
export function useOutbox() {
  const owner = usePersonId();
  const group = usePersonGroup() ?? undefined;
  const ledgerChanged = useLedgerChanged();
  const client = useQueryClient();
  const [entries, setEntries] = useState<QueuedEntry[]>([]);
  /** The queue was read from IndexedDB and a first send was tried. */
  const [ready, setReady] = useState(false);
  const waiting = useRef(0);
  const busy = useRef(false);

  const reload = useCallback(async () => {
    if (!owner) return;
    const now = await entriesOf(owner, group);
    waiting.current = now.filter((e) => e.state === "waiting").length;
    setEntries(now);
  }, [owner, group]);

  const changed = useCallback(() => {
    void ledgerChanged();
    void client.invalidateQueries({ queryKey: ["runs"] });
  }, [ledgerChanged, client]);

  const flush = useCallback(async () => {
    if (!owner || busy.current) return;
    busy.current = true;
    try {
      const result = await flushOwner(owner, group);
      if (result && result.settled > 0) changed();
    } finally {
      busy.current = false;
      await reload();
    }
  }, [owner, group, reload, changed]);

  useEffect(() => {
    if (!owner) return;
    void (async () => {
      // Entries queued by the older, localStorage queue carry no owner: whoever typed them may not be
      // the person signed in now, so they move into IndexedDB held back, not sent under this name.
      try {
        const old = readOutbox(localStorage);
        const held = { status: 409, message: "Entered on this phone before an update, perhaps by someone else: nothing was sent. If it is yours, enter it again; then drop this copy." };
        for (const item of old) await putEntry({ ...item, owner, group, state: "refused", refusal: held });
        if (old.length) localStorage.removeItem(OUTBOX_STORAGE_KEY);
      } catch {
        // storage blocked
      }
      await reload();
      await flush();
      setReady(true);
    })();
    const timer = setInterval(() => {
      if (waiting.current > 0) void flush();
    }, RETRY_MS);
    const online = () => void flush();
    const fromWorker = (e: MessageEvent) => {
      if ((e.data as { type?: string } | null)?.type === "CANTROVE_OUTBOX_CHANGED") {
        changed();
        void reload();
      }
    };
    window.addEventListener("online", online);
    navigator.serviceWorker?.addEventListener("message", fromWorker);
    return () => {
      clearInterval(timer);
      window.removeEventListener("online", online);
      navigator.serviceWorker?.removeEventListener("message", fromWorker);
    };
  }, [owner, group, flush, reload, changed]);

  const sendNow = useCallback(
    (first: OutboxItem, stopId?: string): Promise<SubmitResult> => {
      // A confirmed resend ("yes, record it") goes through the same steps.
      const attempt = async (item: OutboxItem): Promise<SubmitResult> => {
        if (!owner) return { kind: "refused", message: "Sign in again to send this entry." };
        const saved = await putEntry({ ...item, owner, group, state: "waiting", ...(stopId ? { stopId } : {}) });
        const earlier = (await entriesOf(owner, group)).filter((e) => e.state === "waiting" && e.seq < saved.seq);
        if (busy.current || earlier.length > 0) {
          await reload();
          void flush();
          void askForSync();
          return { kind: "queued", message: "Saved on this phone; it will be sent in order." };
        }
        busy.current = true;
        let outcome: SendOutcome;
        try {
          outcome = await sendEntry(saved);
          if (outcome.kind === "retry") await settle(saved, outcome);
          else await deleteEntry(saved.key);
        } finally {
          busy.current = false;
        }
        await reload();
        if (outcome.kind === "retry") {
          void askForSync();
          return { kind: "queued", message: "No connection: saved on this phone and will be sent when you are back online." };
        }
        changed();
        if (outcome.kind === "refused") {
          const { message, fields, question } = outcome;
          return { kind: "refused", message, fields, question, ...(question ? { confirm: () => attempt(confirmedCopy(item, newKey())) } : {}) };
        }
        return { kind: "done", body: outcome.body };
      };
      return attempt(first);
    },
    [owner, group, flush, reload, changed],
  );

  const submit = useCallback(
    (url: string, body: unknown, label: string, stopId?: string, key: string = newKey()) => sendNow(newOutboxItem(url, body, label, new Date(), key), stopId),
    [sendNow],
  );

  /** "Yes, that is right" to a queued entry the server asked about: it goes again, confirmed, under a new key, in its old place. */
  const confirmRefusal = useCallback(
    async (key: string) => {
      const entry = entries.find((e) => e.key === key);
      if (!entry) return;
      await deleteEntry(key);
      const copy = confirmedCopy(entry, newKey());
      await putEntry({ ...entry, ...copy, state: "waiting", refusal: undefined, seq: entry.seq });
      await reload();
      void flush();
    },
    [entries, reload, flush],
  );

  /** A refused entry corrected where it is listed: it goes again with the new numbers, at its time of entry, under a new key, in its old place. */
  const fixRefusal = useCallback(
    async (key: string, values: Record<string, number | null>) => {
      const entry = entries.find((e) => e.key === key && e.state === "refused");
      if (!entry) return;
      const copy = correctedCopy(entry, values, newKey());
      await putEntry({ ...entry, ...copy, state: "waiting", refusal: undefined, seq: entry.seq });
      await deleteEntry(key);
      await reload();
      void flush();
    },
    [entries, reload, flush],
  );

  /** A refused entry the person drops: gone from this phone. */
  const dismissRefusal = useCallback(
    async (key: string) => {
      await deleteEntry(key);
      await reload();
    },
    [reload],
  );

  const items: QueuedEntry[] = entries.filter((e) => e.state === "waiting");
  const refusals: Refusal[] = entries
    .filter((e) => e.state === "refused")
    .map((e) => ({ key: e.key, label: e.label, message: e.refusal?.message ?? "Refused", question: e.refusal?.question, fields: e.refusal?.fields, item: e }));

  return { ready, items, refusals, dismissRefusal: (key: string) => void dismissRefusal(key), confirmRefusal: (key: string) => void confirmRefusal(key), fixRefusal: (key: string, values: Record<string, number | null>) => fixRefusal(key, values), submit, retryNow: flush };
}

