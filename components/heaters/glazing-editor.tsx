"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError, RadioGroup } from "@/components/ui/field";
import { useChangeGlazing } from "@/hooks/queries/heaters";
import { fieldErrors } from "@/lib/api/client";
import { computeCanGrid } from "@/lib/heaters/can-grid";
import { formatNumber } from "@/lib/heaters/format";
import type { CanGridInput } from "@/lib/heaters/schemas";
import { parseNumberInput } from "@/lib/forms/number-input";
import { countOf, noun } from "@/lib/plural";

const COVERAGE = [
  { value: "chamber", label: "The can chamber only (manifolds sealed apart)" },
  { value: "full", label: "The chamber and both manifolds" },
] as const;

/**
 * A length typed in the plan's unit, read by the project's one number parser (lib/forms/number-input.ts):
 * "1,234" is asked about, never taken as 1.234; the value, or the message to show.
 */
function lengthOf(raw: string, unit: "in" | "mm"): { value: number | null; error?: string } {
  const message = `Enter a length in ${unit}, like ${unit === "in" ? "34" : "860"}.`;
  const parsed = parseNumberInput(raw, { noun: noun(unit, unit), decimal: true, required: true, message });
  if (!parsed.ok) return { value: null, error: parsed.error };
  return parsed.value !== null && parsed.value > 0 ? { value: parsed.value } : { value: null, error: message };
}

/**
 * A unit's new glazing (issue 16), for organisers. The new can count is shown as
 * it is typed (the same pure computation the server runs); the server recomputes
 * it, changes the drive's target, and refuses (409) a grid below what is already
 * claimed or built in — that message is shown here, in full, and nothing changes.
 */
export function GlazingEditor({ id, plan, cans, held }: { id: string; plan: CanGridInput; cans: number; held: number }) {
  const router = useRouter();
  const [width, setWidth] = useState(String(plan.glazingWidth));
  const [height, setHeight] = useState(String(plan.glazingHeight));
  const [coverage, setCoverage] = useState<string>(plan.coverage);
  const change = useChangeGlazing(id, { onSuccess: () => router.refresh() });
  const unit = plan.unit === "in" ? "in" : "mm";
  const typedWidth = lengthOf(width, unit);
  const typedHeight = lengthOf(height, unit);
  const [w, h] = [typedWidth.value, typedHeight.value];
  const next = w && h ? computeCanGrid({ ...plan, glazingWidth: w, glazingHeight: h, coverage: coverage as CanGridInput["coverage"] }) : null;
  const server = fieldErrors(change.error);
  return (
    <form
      noValidate
      aria-label="Change the glazing"
      className="flex flex-col gap-3"
      onSubmit={(e) => {
        e.preventDefault();
        if (!w || !h || !next || next.cans === 0) return;
        change.mutate({ ...plan, glazingWidth: w, glazingHeight: h, coverage: coverage as CanGridInput["coverage"] });
      }}
    >
      <FormError message={change.error?.message} />
      <div className="grid gap-3 sm:grid-cols-2">
        <Field id="glazing-width" label={`Glazing width (${unit})`} inputMode="decimal" value={width} onChange={(e) => setWidth(e.target.value)} error={typedWidth.error ?? server["plan.glazingWidth"]} />
        <Field id="glazing-height" label={`Glazing height (${unit})`} inputMode="decimal" value={height} onChange={(e) => setHeight(e.target.value)} error={typedHeight.error ?? server["plan.glazingHeight"]} />
      </div>
      <RadioGroup id="glazing-coverage" name="coverage" label="The sheet covers" options={COVERAGE} value={coverage} onChange={setCoverage} />
      <p aria-live="polite" className="font-semibold">
        {next && next.cans === 0 ? "This sheet is too small to hold one column and one row of cans." : null}
        {next && next.cans > 0 ? `${next.columns} × ${next.rows}: ${countOf(next.cans, "can", formatNumber)} (now ${countOf(cans, "can", formatNumber)}).` : null}
        {next ? null : "Enter both lengths to see the new can grid."}
        {next && next.cans > 0 && held > 0 ? ` ${countOf(held, "can", formatNumber)} are already claimed or built in.` : ""}
      </p>
      {change.isSuccess ? <p role="status" className="font-semibold text-moss-deep">Glazing saved: the unit needs {countOf(change.data.cans, "can", formatNumber)} and the drive&apos;s target follows.</p> : null}
      <div>
        <Button type="submit" disabled={change.isPending || !next || next.cans === 0}>{change.isPending ? "Saving…" : "Save the new glazing"}</Button>
      </div>
    </form>
  );
}
