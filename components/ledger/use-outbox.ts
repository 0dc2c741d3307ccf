"use client";

import { useCallback, useEffect, useRef, useState } from "react";
import { useQueryClient } from "@tanstack/react-query";
import { addToOutbox, classify, markAttempt, readOutbox, removeFromOutbox, type OutboxItem } from "@/lib/ledger/outbox";
import { ledgerKeys } from "@/hooks/queries/ledger";

export type SubmitResult = { kind: "done"; body: unknown } | { kind: "refused"; message: string; fields?: Record<string, string> } | { kind: "queued"; message: string };

const RETRY_MS = 4_000;

async function send(item: OutboxItem) {
  try {
    const res = await fetch(item.url, {
      method: "POST",
      headers: { "content-type": "application/json", "idempotency-key": item.key },
      body: JSON.stringify(item.body),
    });
    const text = await res.text();
    let body: unknown = null;
    try {
      body = text ? JSON.parse(text) : null;
    } catch {
      body = null;
    }
    return classify(res.status, body);
  } catch (error) {
    return classify(null, null, (error as Error).message || "No connection");
  }
}

/** Entries go to localStorage first, then to the server; unacknowledged ones are retried with the same key. */
export function useOutbox() {
  const qc = useQueryClient();
  const [items, setItems] = useState<OutboxItem[]>([]);
  const [refusals, setRefusals] = useState<{ key: string; label: string; message: string }[]>([]);
  const busy = useRef(false);

  const settle = useCallback(
    (item: OutboxItem, outcome: Awaited<ReturnType<typeof send>>) => {
      if (outcome.kind === "retry") {
        setItems(markAttempt(localStorage, item.key, outcome.message));
        return;
      }
      setItems(removeFromOutbox(localStorage, item.key));
      if (outcome.kind === "refused") setRefusals((r) => [...r, { key: item.key, label: item.label, message: outcome.message }]);
      void qc.invalidateQueries({ queryKey: ledgerKeys.all });
    },
    [qc],
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

  const submit = useCallback(
    async (url: string, body: unknown, label: string): Promise<SubmitResult> => {
      const item: OutboxItem = { key: crypto.randomUUID(), url, body, label, createdAt: new Date().toISOString(), attempts: 0 };
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
      void qc.invalidateQueries({ queryKey: ledgerKeys.all });
      if (outcome.kind === "refused") {
        const fields = (outcome as { body?: { error?: { fields?: Record<string, string> } } }).body?.error?.fields;
        return { kind: "refused", message: outcome.message, fields };
      }
      return { kind: "done", body: outcome.body };
    },
    [flush, qc],
  );

  return { items, refusals, dismissRefusal: (key: string) => setRefusals((r) => r.filter((x) => x.key !== key)), submit, retryNow: flush };
}
