"use client";

import { useFormat } from "@/hooks/use-look";
import { weightEntry } from "@/lib/format/weight-entry";
import { useState } from "react";
import { useQuery } from "@tanstack/react-query";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/ui/field";
import { NumberField } from "@/components/ui/number-field";
import { NUMBER_SPECS, parseNumberInputs, type NumberSpec } from "@/lib/forms/number-input";
import { countOf, noun } from "@/lib/plural";
import { Notice } from "@/components/ui/notice";
import { fieldErrorsOf } from "@/lib/api/errors";
import { ledgerSchemas, schemasOr, useLazySchemas } from "@/hooks/use-lazy-schemas";
import { ledgerQueries, useRecordRecycling } from "@/hooks/queries/ledger";

// Money is not a count or a weight; a decimal with "." or "," like 12.50, with no sign or letters.
const MONEY: NumberSpec = {
  noun: noun("money", "money"),
  decimal: true,
  min: 0,
  max: 1_000_000,
  message: "Enter the money received as a number, like 12.50.",
  amount: (n) => n.toLocaleString("en-GB"),
};

/** Rejected cans taken to a scrap dealer or recycling point, with weight and money if any. */
export function RecyclingForm({ driveId }: { driveId: string }) {
  const stock = useQuery(ledgerQueries.stock(driveId));
  const weighed = weightEntry(useFormat().look.units); // typed in the group's units, sent in kg
  const [form, setForm] = useState({ quantity: "", weightKg: "", moneyReceived: "" });
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [done, setDone] = useState<string | null>(null);
  const [missing, setMissing] = useState<string | null>(null);
  const schemas = useLazySchemas(ledgerSchemas);
  const save = useRecordRecycling(driveId, {
    onSuccess: (_res, body) => {
      setDone(`Recorded ${countOf(body.quantity, "can")} taken to recycling.`);
      setForm({ quantity: "", weightKg: "", moneyReceived: "" });
    },
  });

  async function onSubmit(e: React.FormEvent) {
    e.preventDefault();
    setDone(null);
    setMissing(null);
    const numbers = parseNumberInputs({
      quantity: [form.quantity, NUMBER_SPECS.recycledCans],
      weightKg: [form.weightKg, weighed.spec],
      moneyReceived: [form.moneyReceived, MONEY],
    });
    const checks = await schemasOr(schemas, setMissing);
    if (!checks) return;
    const parsed = checks.recyclingInputSchema.safeParse({ ...numbers.values, weightKg: weighed.toKg(numbers.values.weightKg) });
    if (!parsed.success || Object.keys(numbers.errors).length > 0) {
      return setErrors({ ...(parsed.success ? {} : fieldErrorsOf(parsed.error)), ...(numbers.errors as Record<string, string>) });
    }
    setErrors({});
    save.mutate(parsed.data);
  }

  const set = (k: keyof typeof form) => (raw: string) => {
    setForm((f) => ({ ...f, [k]: raw }));
    setErrors(({ [k]: _gone, ...rest }) => rest);
  };
  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-3" aria-label="Rejects taken to recycling" noValidate>
      <p className="text-ink-soft">{stock.data ? `${countOf(stock.data.rejectedOnHand, noun("rejected can is", "rejected cans are"))} waiting to go.` : "Loading…"}</p>
      <div className="grid gap-3 sm:grid-cols-3">
        <NumberField id="recycle-quantity" label="Cans" spec={NUMBER_SPECS.recycledCans} value={form.quantity} onChange={set("quantity")} error={errors.quantity} />
        <NumberField id="recycle-weight" label={`Weight in ${weighed.unit} (optional)`} spec={weighed.spec} value={form.weightKg} onChange={set("weightKg")} error={errors.weightKg} />
        <NumberField id="recycle-money" label="Money received (optional)" spec={MONEY} value={form.moneyReceived} onChange={set("moneyReceived")} error={errors.moneyReceived} />
      </div>
      <FormError message={missing ?? save.error?.message} />
      {done ? <Notice tone="good" title={done} /> : null}
      <div>
        <Button type="submit" disabled={save.isPending}>{save.isPending ? "Saving…" : "Record recycling"}</Button>
      </div>
    </form>
  );
}
