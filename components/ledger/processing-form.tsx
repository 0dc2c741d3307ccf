"use client";

import { useState } from "react";
import { useQuery } from "@tanstack/react-query";
import { fieldErrorsOf } from "@/lib/api/errors";
import { LOSS_REASON_LABEL, type LossReason } from "@/lib/ledger/codes";
import { ledgerSchemas, schemasOr, useLazySchemas } from "@/hooks/use-lazy-schemas";
import { stageLabel } from "@/lib/ledger/labels";
import { ledgerQueries } from "@/hooks/queries/ledger";
import { ProcessingCaution } from "./cautions";
import { NumberField } from "@/components/ui/number-field";
import { NUMBER_SPECS, parseNumberInput, parseNumberInputs } from "@/lib/forms/number-input";
import { countOf, noun } from "@/lib/plural";
import { LossFields, lossReasonsFor, ownLossReason } from "./loss-fields";
import { EntryActions, useEntrySubmit, type Submit } from "./entry-submit";

const STEPS = [
  { from: "good", to: "washed", label: "Washed" },
  { from: "washed", to: "opened", label: "Opened (tops off)" },
  { from: "opened", to: "punched", label: "Punched" },
] as const;

export function ProcessingForm({ driveId, submit }: { driveId: string; submit: Submit }) {
  const stock = useQuery(ledgerQueries.stock(driveId));
  const [stepIndex, setStepIndex] = useState(0);
  const [quantityText, setQuantity] = useState("");
  const [lostText, setLost] = useState("0");
  const [chosenReason, setLossReason] = useState<LossReason | null>(null);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const { send, clear: clearStatus, refuse, status } = useEntrySubmit();
  const schemas = useLazySchemas(ledgerSchemas);
  const step = STEPS[stepIndex];
  const available = stock.data ? stock.data.stages[step.from] : null;
  const lossReason = chosenReason && lossReasonsFor(step.to).includes(chosenReason) ? chosenReason : ownLossReason(step.to);

  const typedQuantity = parseNumberInput(quantityText, NUMBER_SPECS.batchCans);
  const shownQuantity = typedQuantity.ok ? (typedQuantity.value ?? 0) : 0;
  const clear = (key: string) => setErrors(({ [key]: _gone, ...rest }) => rest);

  async function onSubmit(e: React.FormEvent) {
    e.preventDefault();
    clearStatus(); // an earlier "recorded" must not stand above this try's errors
    // Anything typed that is not a whole number stops here; nothing else is ever sent in its place.
    const numbers = parseNumberInputs({ quantity: [quantityText, NUMBER_SPECS.batchCans], "lost.quantity": [lostText, NUMBER_SPECS.lostCans] });
    const quantity = numbers.values.quantity;
    const lost = numbers.values["lost.quantity"] ?? 0;
    const checks = await schemasOr(schemas, refuse);
    if (!checks) return;
    const parsed = checks.processingInputSchema.safeParse({ from: step.from, to: step.to, quantity, ...(lost > 0 ? { lost: { reason: lossReason, quantity: lost } } : {}) });
    if (!parsed.success || Object.keys(numbers.errors).length > 0) {
      return setErrors({ ...(parsed.success ? {} : fieldErrorsOf(parsed.error)), ...(numbers.errors as Record<string, string>) });
    }
    setErrors({});
    const lostNote = lost > 0 ? `, ${lost} lost (${LOSS_REASON_LABEL[lossReason].toLowerCase()})` : "";
    await send(
      () => submit(`/api/drives/${driveId}/processing`, parsed.data, `${step.label}: ${countOf(parsed.data.quantity, "can")}${lostNote}`),
      (result) => {
        setQuantity("");
        setLost("0");
        if (result.kind === "queued") return result.message;
        const body = result.body as { holes: number | null; holesPerCan: number | null };
        return `${step.label}: ${countOf(parsed.data.quantity, "can")} recorded${lostNote}.${body.holes ? ` That batch needed ${countOf(body.holes, "hole")} (${body.holesPerCan} a can).` : ""}`;
      },
    );
  }

  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="Log processing" noValidate>
      <fieldset>
        <legend className="mb-2 font-semibold">What did you do?</legend>
        <div className="grid grid-cols-3 gap-2">
          {STEPS.map((s, i) => (
            <label key={s.to} className={`flex min-h-11 cursor-pointer items-center justify-center rounded-lg border-2 px-2 text-center font-semibold ${i === stepIndex ? "border-ember bg-ember-soft" : "border-ink/30 bg-white"}`}>
              <input type="radio" name="processing-step" className="sr-only" checked={i === stepIndex} onChange={() => setStepIndex(i)} />
              {s.label}
            </label>
          ))}
        </div>
      </fieldset>
      <ProcessingCaution to={step.to} />
      <p className="text-ink-soft">
        {available === null ? "Loading what is on hand…" : `${countOf(available, noun("can is", "cans are"))} ${stageLabel(step.from)} and can move on.`}
      </p>
      <NumberField
        id="processing-quantity"
        label="Cans in this batch"
        spec={NUMBER_SPECS.batchCans}
        steppers
        bigStep={10}
        value={quantityText}
        onChange={(raw) => {
          setQuantity(raw);
          clear("quantity");
        }}
        error={errors.quantity ?? errors.to}
      />
      {step.to === "punched" && shownQuantity > 0 ? <p className="text-ink-soft">At 4 holes a can that is {countOf(shownQuantity * 4, "hole")}; the answer uses your units&apos; own count.</p> : null}
      <LossFields
        to={step.to}
        from={step.from}
        reason={lossReason}
        quantity={lostText}
        onReason={setLossReason}
        onQuantity={(raw) => {
          setLost(raw);
          clear("lost.quantity");
        }}
        errors={errors}
      />
      <EntryActions status={status} label="Record processing" />
    </form>
  );
}
