"use client";

import { useState } from "react";
import { useQuery } from "@tanstack/react-query";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { Skeleton } from "@/components/ui/card";
import { fieldErrorsOf } from "@/lib/api/errors";
import { NUMBER_SPECS, parseNumberInput } from "@/lib/forms/number-input";
import { NumberInput } from "@/components/ui/number-field";
import { plural } from "@/lib/plural";
import { ledgerQueries, usePostStockCount, useUndoMovement } from "@/hooks/queries/ledger";
import type { PostedStockCount } from "@/lib/ledger/types";
import { COUNTABLE_LABEL, COUNTABLE_STAGES, countDifferences, stockCountInputSchema, type CountableStage } from "@/lib/ledger/stock-count-schema";

const signed = (n: number) => (n > 0 ? `+${n}` : `−${-n}`);

// What is physically on hand, typed beside each running total; the differences
// are posted as one adjustment entry with a reason. A box left empty is not counted.
export function StockCountForm({ driveId }: { driveId: string }) {
  const stock = useQuery(ledgerQueries.stock(driveId));
  const [typed, setTyped] = useState<Partial<Record<CountableStage, string>>>({});
  const [reason, setReason] = useState("");
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [posted, setPosted] = useState<PostedStockCount | null>(null);
  const post = usePostStockCount(driveId, {
    onSuccess: (body) => {
      setPosted(body);
      setTyped({});
      setReason("");
    },
  });
  const undo = useUndoMovement();

  if (stock.isPending) return <Skeleton className="h-64 w-full" />;
  if (stock.isError) return <p className="text-alarm">Could not load the running totals: {stock.error.message}</p>;
  const totals: Record<CountableStage, number> = { ...stock.data.stages, rejected: stock.data.rejectedOnHand };

  // Exactly what was typed is kept; anything but a whole number is an error, never silently changed.
  const counted: Partial<Record<CountableStage, number>> = {};
  const bad: Record<string, string> = {};
  for (const s of COUNTABLE_STAGES) {
    const p = parseNumberInput(typed[s] ?? "", NUMBER_SPECS.countedCans);
    if (!p.ok) bad[`counted.${s}`] = p.error;
    else if (p.value !== null) counted[s] = p.value;
  }
  const differences = countDifferences(counted, totals);

  function onSubmit(e: React.FormEvent) {
    e.preventDefault();
    setPosted(null);
    const expected = Object.fromEntries(Object.keys(counted).map((s) => [s, totals[s as CountableStage]]));
    const parsed = stockCountInputSchema.safeParse({ counted, expected, reason });
    const found = { ...bad, ...(parsed.success ? {} : fieldErrorsOf(parsed.error)) };
    if (Object.keys(found).length > 0) return setErrors(found);
    setErrors({});
    post.mutate(parsed.data);
  }

  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="Stock count" noValidate>
      <table className="w-full border-collapse text-left">
        <thead>
          <tr className="border-b-2 border-paper-edge text-sm text-ink-soft">
            <th scope="col" className="py-2 pr-2">Stage</th>
            <th scope="col" className="py-2 pr-2 text-right">Running total</th>
            <th scope="col" className="py-2 pr-2 text-right">On hand</th>
            <th scope="col" className="py-2 text-right">Difference</th>
          </tr>
        </thead>
        <tbody>
          {COUNTABLE_STAGES.map((s) => {
            const diff = counted[s] === undefined ? null : counted[s]! - totals[s];
            const error = bad[`counted.${s}`] ?? errors[`counted.${s}`];
            return (
              <tr key={s} className="border-b border-paper-edge align-top">
                <th scope="row" className="py-2 pr-2 font-semibold">
                  <label htmlFor={`count-${s}`}>{COUNTABLE_LABEL[s]}</label>
                </th>
                <td className="py-2 pr-2 text-right tabular-nums" data-total={s}>{totals[s]}</td>
                <td className="py-2 pr-2 text-right">
                  <NumberInput
                    id={`count-${s}`}
                    name={COUNTABLE_LABEL[s]}
                    spec={NUMBER_SPECS.countedCans}
                    boxClassName="w-24 px-2 text-right text-lg tabular-nums"
                    value={typed[s] ?? ""}
                    error={error}
                    onChange={(raw) => setTyped((t) => ({ ...t, [s]: raw }))}
                  />
                </td>
                <td className={`py-2 text-right font-semibold tabular-nums ${diff ? "text-ember-deep" : "text-ink-faint"}`} data-difference={s}>
                  {diff === null ? "" : diff === 0 ? "matches" : signed(diff)}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <div className="flex flex-col gap-1">
        <label htmlFor="count-reason" className="font-semibold">Why does it differ?</label>
        <textarea
          id="count-reason"
          rows={2}
          className={`rounded-lg border-2 bg-white px-3 py-2 ${errors.reason ? "border-alarm" : "border-ink/40"}`}
          value={reason}
          maxLength={500}
          aria-describedby="count-reason-error"
          onChange={(e) => setReason(e.target.value)}
        />
        <p id="count-reason-error" aria-live="polite" className="text-sm font-semibold text-alarm">{errors.reason ?? ""}</p>
      </div>
      <FormError message={post.error?.message ?? errors.counted ?? undo.error?.message} />
      {posted ? (
        <Notice tone="good" title={`Stock count posted as one adjustment: ${posted.lines.map((l) => `${COUNTABLE_LABEL[l.stage].toLowerCase()} ${signed(l.difference)}`).join(", ")}.`}>
          {undo.isSuccess ? (
            <p>Undone: the running totals are back to what they were.</p>
          ) : (
            <Button type="button" variant="secondary" disabled={undo.isPending} onClick={() => undo.mutate({ movementId: posted.movementId })}>
              Undo this count
            </Button>
          )}
        </Notice>
      ) : null}
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={post.isPending || differences.length === 0}>
          {post.isPending ? "Posting…" : "Post the difference"}
        </Button>
        <span className="text-sm text-ink-soft">{differences.length === 0 ? "Type what you counted; stages that match need nothing." : `${differences.length} ${plural(differences.length, "stage")} to adjust.`}</span>
      </div>
    </form>
  );
}
