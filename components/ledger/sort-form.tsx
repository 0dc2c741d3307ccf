"use client";

import { useState } from "react";
import { useQuery } from "@tanstack/react-query";
import { EmptyState, Skeleton } from "@/components/ui/card";
import { FormError } from "@/components/ui/field";
import { fieldErrorsOf } from "@/lib/api/errors";
import { REJECT_REASON_LABEL, REJECT_REASONS, type RejectReason } from "@/lib/ledger/codes";
import { ledgerSchemas, schemasOr, useLazySchemas } from "@/hooks/use-lazy-schemas";
import { ledgerQueries } from "@/hooks/queries/ledger";
import { SortCaution } from "./cautions";
import { EntryActions, useEntrySubmit, type Submit } from "./entry-submit";
import { NumberField } from "@/components/ui/number-field";
import { NUMBER_SPECS, parseNumberInput, parseNumberInputs } from "@/lib/forms/number-input";
import { countOf, plural } from "@/lib/plural";
import { useFormat } from "@/hooks/use-look";

const zeroRejects = () => Object.fromEntries(REJECT_REASONS.map((r) => [r, "0"])) as Record<RejectReason, string>;
// What the boxes hold as numbers, for the running "Counted" line; a box that is not a number counts nothing.
const valueOf = (raw: string) => {
  const p = parseNumberInput(raw, NUMBER_SPECS.rejectedCans);
  return p.ok ? (p.value ?? 0) : 0;
};

export function SortForm({ driveId, submit }: { driveId: string; submit: Submit }) {
  const f = useFormat();
  const hauls = useQuery(ledgerQueries.openHauls(driveId));
  const [chosen, setChosen] = useState<string[]>([]);
  const [goodText, setGood] = useState("0");
  const [rejected, setRejected] = useState(zeroRejects);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const { send, clear: clearStatus, refuse, status } = useEntrySubmit();
  const schemas = useLazySchemas(ledgerSchemas);
  const good = valueOf(goodText);
  const rejectTotal = Object.values(rejected).reduce((s, raw) => s + valueOf(raw), 0);
  const counted = good + rejectTotal;
  const clear = (key: string) => setErrors(({ [key]: _gone, ...rest }) => rest);

  async function onSubmit(e: React.FormEvent) {
    e.preventDefault();
    clearStatus(); // an earlier "recorded" must not stand above this try's errors
    // Anything typed that is not a whole number stops here; nothing else is ever sent in its place.
    const numbers = parseNumberInputs({
      good: [goodText, NUMBER_SPECS.goodCans],
      ...Object.fromEntries(REJECT_REASONS.map((r) => [`rejected.${r}`, [rejected[r], NUMBER_SPECS.rejectedCans]])),
    } as Record<string, [string, typeof NUMBER_SPECS.goodCans]>);
    const nonZero = Object.fromEntries(REJECT_REASONS.map((r) => [r, numbers.values[`rejected.${r}`] ?? 0]).filter(([, n]) => (n as number) > 0));
    const checks = await schemasOr(schemas, refuse);
    if (!checks) return;
    const parsed = checks.sortInputSchema.safeParse({ haulIds: chosen, good: numbers.values.good, rejected: nonZero });
    if (!parsed.success || Object.keys(numbers.errors).length > 0) {
      return setErrors({ ...(parsed.success ? {} : fieldErrorsOf(parsed.error)), ...(numbers.errors as Record<string, string>) });
    }
    setErrors({});
    await send(
      () => submit(`/api/drives/${driveId}/sorts`, parsed.data, `Sort: ${good} good, ${rejectTotal} rejected`),
      (result) => {
        setChosen([]);
        setGood("0");
        setRejected(zeroRejects());
        return result.kind === "done" ? `Sort recorded: ${good} good ${plural(good, "can")}, ${rejectTotal} rejected.` : result.message;
      },
    );
  }

  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="Log a sort" noValidate>
      <SortCaution />
      <fieldset className="flex flex-col gap-2" aria-describedby="sort-hauls-error">
        <legend className="mb-1 font-semibold">Which hauls did you count?</legend>
        {hauls.isPending ? (
          <Skeleton className="h-11 w-full" />
        ) : hauls.isError ? (
          <FormError message="Could not load the hauls. Check the connection and reopen this tab." />
        ) : hauls.data.length === 0 ? (
          <EmptyState title="No hauls waiting to be sorted">Log a haul first; it shows here until a sort counts it.</EmptyState>
        ) : (
          hauls.data.map((h) => (
            <label key={h.id} className="flex min-h-11 items-center gap-3 rounded-lg border-2 border-paper-edge bg-white px-3 py-2">
              <input
                type="checkbox"
                className="h-5 w-5"
                checked={chosen.includes(h.id)}
                onChange={(e) => setChosen((c) => (e.target.checked ? [...c, h.id] : c.filter((x) => x !== h.id)))}
              />
              <span>
                {h.dropPointName} · {countOf(h.bags, "bag")}{h.weightKg !== null ? ` · ${f.mass(h.weightKg)}` : ""} · ≈{countOf(h.estimatedCans, "can")}
                <span className="block text-sm text-ink-faint">{f.moment(h.hauledAt)}</span>
              </span>
            </label>
          ))
        )}
        <p id="sort-hauls-error" aria-live="polite" className="text-sm font-semibold text-alarm">
          {errors.haulIds ?? ""}
        </p>
      </fieldset>
      <NumberField
        id="sort-good"
        label="Good cans"
        spec={NUMBER_SPECS.goodCans}
        steppers
        bigStep={10}
        value={goodText}
        onChange={(raw) => {
          setGood(raw);
          clear("good");
        }}
        error={errors.good}
      />
      <fieldset className="flex flex-col gap-1">
        <legend className="mb-1 font-semibold">Rejected, by reason</legend>
        {REJECT_REASONS.map((r) => (
          <NumberField
            key={r}
            id={`sort-reject-${r}`}
            label={REJECT_REASON_LABEL[r]}
            spec={NUMBER_SPECS.rejectedCans}
            steppers
            value={rejected[r]}
            onChange={(raw) => {
              setRejected((x) => ({ ...x, [r]: raw }));
              clear(`rejected.${r}`);
            }}
            error={errors[`rejected.${r}`]}
          />
        ))}
      </fieldset>
      <p className="text-ink-soft" aria-live="polite">
        Counted {countOf(counted, "can")}{counted > 0 ? ` · yield ${Math.round((good / counted) * 100)} %` : ""}
      </p>
      <EntryActions status={status} label="Record sort" />
    </form>
  );
}
