"use client";

import { useState } from "react";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { Button } from "@/components/ui/button";
import { Field, FormError } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { fetchJson } from "@/lib/api/client";
import { fieldErrorsOf } from "@/lib/api/errors";
import { recyclingInputSchema } from "@/lib/ledger/schemas";
import { ledgerKeys, stockQuery } from "@/hooks/queries/ledger";

const num = (s: string) => (s.trim() === "" ? null : Number(s.replace(",", ".")));

/** Rejected cans taken to a scrap dealer or recycling point, with weight and money if any. */
export function RecyclingForm({ driveId }: { driveId: string }) {
  const qc = useQueryClient();
  const stock = useQuery(stockQuery(driveId));
  const [form, setForm] = useState({ quantity: "", weightKg: "", moneyReceived: "" });
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [done, setDone] = useState<string | null>(null);
  const save = useMutation({
    mutationFn: (body: unknown) => fetchJson(`/api/drives/${driveId}/recycling`, { method: "POST", json: body, headers: { "idempotency-key": crypto.randomUUID() } }),
    onSuccess: () => {
      setDone(`Recorded ${form.quantity} cans taken to recycling.`);
      setForm({ quantity: "", weightKg: "", moneyReceived: "" });
      return qc.invalidateQueries({ queryKey: ledgerKeys.all });
    },
  });

  function onSubmit(e: React.FormEvent) {
    e.preventDefault();
    setDone(null);
    const parsed = recyclingInputSchema.safeParse({ quantity: num(form.quantity) ?? NaN, weightKg: num(form.weightKg), moneyReceived: num(form.moneyReceived) });
    if (!parsed.success) return setErrors(fieldErrorsOf(parsed.error));
    setErrors({});
    save.mutate(parsed.data);
  }

  const set = (k: keyof typeof form) => (e: React.ChangeEvent<HTMLInputElement>) => setForm((f) => ({ ...f, [k]: e.target.value }));
  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-3" aria-label="Rejects taken to recycling" noValidate>
      <p className="text-ink-soft">{stock.data ? `${stock.data.rejectedOnHand} rejected cans are waiting to go.` : "Loading…"}</p>
      <div className="grid gap-3 sm:grid-cols-3">
        <Field id="recycle-quantity" label="Cans" inputMode="numeric" value={form.quantity} onChange={set("quantity")} error={errors.quantity} />
        <Field id="recycle-weight" label="Weight in kg (optional)" inputMode="decimal" value={form.weightKg} onChange={set("weightKg")} error={errors.weightKg} />
        <Field id="recycle-money" label="Money received (optional)" inputMode="decimal" value={form.moneyReceived} onChange={set("moneyReceived")} error={errors.moneyReceived} />
      </div>
      <FormError message={save.error?.message} />
      {done ? <Notice tone="good" title={done} /> : null}
      <div>
        <Button type="submit" disabled={save.isPending}>{save.isPending ? "Saving…" : "Record recycling"}</Button>
      </div>
    </form>
  );
}
