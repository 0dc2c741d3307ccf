"use client";

import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { attemptsText, type OutboxItem } from "@/lib/ledger/browser-queue";
import type { Refusal } from "./use-outbox";
import { RefusalFix } from "./refusal-fix";
import { countOf, noun } from "@/lib/plural";
import { useFormat } from "@/hooks/use-look";

export function OutboxList({
  items,
  refusals,
  onRetry,
  onDismiss,
  onConfirm,
  onFix,
}: {
  items: OutboxItem[];
  refusals: Refusal[];
  onRetry: () => void;
  onDismiss: (key: string) => void;
  /** "Yes, that is right" to an entry the server asked about while it waited in the queue. */
  onConfirm: (key: string) => void;
  /** The corrected numbers of a refused entry: it goes again, at its time of entry. */
  onFix: (key: string, values: Record<string, number | null>) => Promise<void>;
}) {
  const f = useFormat();
  if (items.length === 0 && refusals.length === 0) return null;
  return (
    <section aria-label="Waiting to send" className="flex flex-col gap-2" data-testid="outbox">
      {items.length ? (
        <Notice tone="info" title={`${countOf(items.length, noun("entry is", "entries are"))} waiting to be sent`}>
          <p>Kept on this phone and sent in order once there is a signal, even if you close the page; each is recorded with the time you entered it.</p>
          <ul className="mt-2 list-disc pl-5">
            {items.map((i) => (
              <li key={i.key} data-testid="waiting-entry">
                {i.label} <span className="text-sm font-semibold text-ink-soft">· waiting, entered {f.time(i.createdAt)}</span>
                {i.attempts ? <span className="block text-sm text-ink-faint">{attemptsText(i.attempts, i.lastError)}</span> : null}
              </li>
            ))}
          </ul>
          <Button type="button" variant="secondary" className="mt-2" onClick={onRetry}>
            Try now
          </Button>
        </Notice>
      ) : null}
      {refusals.map((r) =>
        r.question ? (
          <div key={r.key} role="alertdialog" aria-label="Check this number" className="rounded-lg border-2 border-sun bg-sun-soft px-3 py-2">
            <p className="font-semibold">Not recorded yet: {r.label}</p>
            <p>Really? {r.question}</p>
            <div className="mt-1 flex flex-wrap gap-2">
              <Button type="button" onClick={() => onConfirm(r.key)}>
                Yes, record it
              </Button>
              <Button type="button" variant="quiet" onClick={() => onDismiss(r.key)}>
                No, drop it
              </Button>
            </div>
          </div>
        ) : (
          <div key={r.key} role="alert" className="rounded-lg border-2 border-alarm bg-alarm-soft px-3 py-2">
            <p className="font-semibold text-alarm">Not recorded: {r.label}</p>
            <p>The server said: {r.message}</p>
            <p className="text-sm text-ink-soft">Entered {f.moment(r.item.createdAt)}. Fix it here and it goes again with that time, or drop it.</p>
            <div className="mt-1 flex flex-wrap gap-2">
              <RefusalFix refusal={r} onFix={onFix} />
              <Button type="button" variant="quiet" onClick={() => onDismiss(r.key)}>
                Drop it
              </Button>
            </div>
          </div>
        ),
      )}
    </section>
  );
}
