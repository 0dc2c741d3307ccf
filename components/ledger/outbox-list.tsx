"use client";

import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import type { OutboxItem } from "@/lib/ledger/outbox";

export function OutboxList({
  items,
  refusals,
  onRetry,
  onDismiss,
}: {
  items: OutboxItem[];
  refusals: { key: string; label: string; message: string }[];
  onRetry: () => void;
  onDismiss: (key: string) => void;
}) {
  if (items.length === 0 && refusals.length === 0) return null;
  return (
    <section aria-label="Waiting to send" className="flex flex-col gap-2" data-testid="outbox">
      {items.length ? (
        <Notice tone="info" title={`${items.length} ${items.length === 1 ? "entry is" : "entries are"} waiting to be sent`}>
          <p>Kept on this phone and retried every few seconds; nothing is lost if you close the page.</p>
          <ul className="mt-2 list-disc pl-5">
            {items.map((i) => (
              <li key={i.key}>
                {i.label}
                {i.attempts ? <span className="text-ink-faint"> · {i.attempts} tries ({i.lastError})</span> : null}
              </li>
            ))}
          </ul>
          <Button type="button" variant="secondary" className="mt-2" onClick={onRetry}>
            Try now
          </Button>
        </Notice>
      ) : null}
      {refusals.map((r) => (
        <div key={r.key} role="alert" className="rounded-lg border-2 border-alarm bg-alarm-soft px-3 py-2">
          <p className="font-semibold text-alarm">Not recorded: {r.label}</p>
          <p>{r.message}</p>
          <Button type="button" variant="quiet" onClick={() => onDismiss(r.key)}>
            Dismiss
          </Button>
        </div>
      ))}
    </section>
  );
}
