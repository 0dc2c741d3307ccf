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
import { countOf } from "@/lib/plural";

const COVERAGE = [
  { value: "chamber", label: "The can chamber only (manifolds sealed apart)" },
  { value: "full", label: "The chamber and both manifolds" },
] as const;

/** A length typed in the plan's unit: a positive number, or null while it is not one. */
const lengthOf = (raw: string) => {
  const n = Number(raw.trim().replace(",", "."));
  return raw.trim() !== "" && Number.isFinite(n) && n > 0 ? n : null;
};

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
  const w = lengthOf(width);
  const h = lengthOf(height);
  const next = w && h ? computeCanGrid({ ...plan, glazingWidth: w, glazingHeight: h, coverage: coverage as CanGridInput["coverage"] }) : null;
  const server = fieldErrors(change.error);
  const unit = plan.unit === "in" ? "in" : "mm";
  const wrong = `Enter a length in ${unit}, like ${unit === "in" ? "34" : "860"}.`;
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
        <Field id="glazing-width" label={`Glazing width (${unit})`} inputMode="decimal" value={width} onChange={(e) => setWidth(e.target.value)} error={w ? server["plan.glazingWidth"] : wrong} />
        <Field id="glazing-height" label={`Glazing height (${unit})`} inputMode="decimal" value={height} onChange={(e) => setHeight(e.target.value)} error={h ? server["plan.glazingHeight"] : wrong} />
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
