"use client";

import { LOSS_REASON_LABEL, LOSS_REASONS, LOSS_STEP, PROCESS_TO, type LossReason } from "@/lib/ledger/codes";
import { SelectField } from "@/components/ui/field";
import { NumberField } from "@/components/ui/number-field";
import { NUMBER_SPECS } from "@/lib/forms/number-input";

type To = (typeof PROCESS_TO)[number];

/** The loss reasons a step can have: its own and the earlier steps' (cans found damaged later), never a later one. */
export function lossReasonsFor(to: To): LossReason[] {
  return LOSS_REASONS.filter((r) => PROCESS_TO.indexOf(LOSS_STEP[r]) <= PROCESS_TO.indexOf(to));
}

/** The step's own reason, which is what a loss during it usually is. */
export const ownLossReason = (to: To): LossReason => LOSS_REASONS.find((r) => LOSS_STEP[r] === to)!;

// The processing form's "lost on the way" part: cans damaged during the step
// leave their stage for the rejects, with the reason, in the same entry.
export function LossFields({
  to,
  from,
  reason,
  quantity,
  onReason,
  onQuantity,
  errors,
}: {
  to: To;
  from: string;
  reason: LossReason;
  /** What is typed in the box, kept as typed. */
  quantity: string;
  onReason: (r: LossReason) => void;
  onQuantity: (raw: string) => void;
  errors: Record<string, string>;
}) {
  return (
    <fieldset className="flex flex-col gap-2 rounded-lg border-2 border-dashed border-ink/30 p-3">
      <legend className="px-1 font-semibold">Lost on the way</legend>
      <p className="text-sm text-ink-soft">Crushed, torn or bent so badly they can&apos;t be used? They go to the rejects from {from}, not on to {to}.</p>
      <SelectField
        id="processing-lost-reason"
        label="How were they damaged?"
        value={reason}
        onChange={(e) => onReason(e.target.value as LossReason)}
        error={errors["lost.reason"]}
        options={lossReasonsFor(to).map((r) => ({ value: r, label: LOSS_REASON_LABEL[r] }))}
      />
      <NumberField id="processing-lost" label="Cans lost" spec={NUMBER_SPECS.lostCans} steppers value={quantity} onChange={onQuantity} error={errors["lost.quantity"] ?? errors.lost} />
    </fieldset>
  );
}
