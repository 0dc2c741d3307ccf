"use client";

import { useCallback, useEffect, useRef, useState } from "react";
import { addToOutbox, classify, confirmedCopy, markAttempt, newOutboxItem, readOutbox, removeFromOutbox, type OutboxItem } from "@/lib/ledger/browser-queue";
import { useLedgerChanged } from "@/hooks/queries/ledger";
import { ApiError, fetchJsonWithHeaders } from "@/lib/api/client";

export type SubmitResult =
  | { kind: "done"; body: unknown }
  /** `question` and `confirm` when the server asks about an unusual number: `confirm()` sends it again, confirmed. */
  | { kind: "refused"; message: string; fields?: Record<string, string>; question?: string; confirm?: () => Promise<SubmitResult> }
  | { kind: "queued"; message: string };

export interface Refusal {
  key: string;
  label: string;
  message: string;
  question?: string;
  item: OutboxItem;
}

const RETRY_MS = 4_000;

/** One try through the app's one fetch wrapper, with the entry's own Idempotency-Key every time. */
async function send(item: OutboxItem) {
  try {
    const res = await fetchJsonWithHeaders(item.url, { method: "POST", body: item.body, headers: { "idempotency-key": item.key } });
    return classify(res.status, res.body);
  } catch (error) {
    if (error instanceof ApiError && error.status > 0) {
      return classify(error.status, { error: { ...error.details, code: error.code, message: error.message, fields: error.fields } });
    }
    return classify(null, null, (error as Error).message || "No connection");
  }
}

/** Entries go to localStorage first, then to the server; unacknowledged ones are retried with the same key. */
export function useOutbox() {
  const ledgerChanged = useLedgerChanged();
  const [items, setItems] = useState<OutboxItem[]>([]);
  const [refusals, setRefusals] = useState<Refusal[]>([]);
  const busy = useRef(false);

  const settle = useCallback(
    (item: OutboxItem, outcome: Awaited<ReturnType<typeof send>>) => {
      if (outcome.kind === "retry") {
        setItems(markAttempt(localStorage, item.key, outcome.message));
        return;
      }
      setItems(removeFromOutbox(localStorage, item.key));
      if (outcome.kind === "refused") setRefusals((r) => [...r, { key: item.key, label: item.label, message: outcome.message, question: outcome.question, item }]);
      void ledgerChanged();
    },
    [ledgerChanged],
  );

  const flush = useCallback(async () => {
    if (busy.current) return;
    busy.current = true;
    try {
      // One after another, oldest first: a sort may depend on a haul queued before it.
      for (const item of readOutbox(localStorage)) {
        const outcome = await send(item);
        settle(item, outcome);
        if (outcome.kind === "retry") break;
      }
    } finally {
      busy.current = false;
    }
  }, [settle]);

  useEffect(() => {
    // eslint-disable-next-line react-hooks/set-state-in-effect -- the queue lives in localStorage, which the server render cannot read: loaded once mounted
    setItems(readOutbox(localStorage));
    void flush();
    const timer = setInterval(() => {
      if (readOutbox(localStorage).length) void flush();
    }, RETRY_MS);
    const online = () => void flush();
    window.addEventListener("online", online);
    return () => {
      clearInterval(timer);
      window.removeEventListener("online", online);
    };
  }, [flush]);

  const sendNow = useCallback(
    (first: OutboxItem): Promise<SubmitResult> => {
    // A confirmed resend ("yes, record it") goes through the same steps.
    const attempt = async (item: OutboxItem): Promise<SubmitResult> => {
      setItems(addToOutbox(localStorage, item));
      if (busy.current || readOutbox(localStorage).length > 1) {
        void flush();
        return { kind: "queued", message: "Saved on this phone; it will be sent in order." };
      }
      busy.current = true;
      let outcome;
      try {
        outcome = await send(item);
      } finally {
        busy.current = false;
      }
      if (outcome.kind === "retry") {
        setItems(markAttempt(localStorage, item.key, outcome.message));
        return { kind: "queued", message: "No connection: saved on this phone and will be sent when you are back online." };
      }
      setItems(removeFromOutbox(localStorage, item.key));
      void ledgerChanged();
      if (outcome.kind === "refused") {
        const { message, fields, question } = outcome;
        return { kind: "refused", message, fields, question, ...(question ? { confirm: () => attempt(confirmedCopy(item, crypto.randomUUID())) } : {}) };
      }
      return { kind: "done", body: outcome.body };
    };
    return attempt(first);
    },
    [flush, ledgerChanged],
  );

  const submit = useCallback(
    (url: string, body: unknown, label: string) => sendNow(newOutboxItem(url, body, label, new Date(), crypto.randomUUID())),
    [sendNow],
  );

  /** "Yes, that is right" to a queued entry the server asked about: it goes again, confirmed, under a new key. */
  const confirmRefusal = useCallback(
    (key: string) => {
      const refusal = refusals.find((r) => r.key === key);
      setRefusals((r) => r.filter((x) => x.key !== key));
      if (refusal) {
        setItems(addToOutbox(localStorage, confirmedCopy(refusal.item, crypto.randomUUID())));
        void flush();
      }
    },
    [refusals, flush],
  );

  return { items, refusals, dismissRefusal: (key: string) => setRefusals((r) => r.filter((x) => x.key !== key)), confirmRefusal, submit, retryNow: flush };
}
