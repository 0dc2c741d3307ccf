"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { FormError, SelectField } from "@/components/ui/field";
import { NumberField } from "@/components/ui/number-field";
import { Notice } from "@/components/ui/notice";
import { fieldErrorsOf } from "@/lib/api/errors";
import { haulInputSchema } from "@/lib/ledger/schemas";
import { HaulCaution } from "./cautions";
import { ConfirmUnusual } from "./confirm-unusual";
import { NUMBER_SPECS, parseNumberInputs } from "@/lib/forms/number-input";
import { countOf } from "@/lib/plural";
import type { SubmitResult } from "./use-outbox";

type Submit = (url: string, body: unknown, label: string) => Promise<SubmitResult>;

export function HaulForm({ driveId, dropPoints, initialDropPointId, submit }: { driveId: string; dropPoints: { id: string; name: string }[]; initialDropPointId?: string; submit: Submit }) {
  const [dropPointId, setDropPointId] = useState(dropPoints.some((p) => p.id === initialDropPointId) ? initialDropPointId! : "");
  const [bags, setBags] = useState("1");
  const [weight, setWeight] = useState("");
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<{ tone: "good" | "info" | "error"; text: string } | null>(null);
  const [pending, setPending] = useState(false);
  const [ask, setAsk] = useState<{ question: string; confirm: () => Promise<SubmitResult> } | null>(null);

  // A box's old error goes once it is edited; what is typed then speaks for itself.
  const edit = (key: string, set: (raw: string) => void) => (raw: string) => {
    set(raw);
    setErrors(({ [key]: _gone, ...rest }) => rest);
  };

  async function onSubmit(e: React.FormEvent) {
    e.preventDefault();
    setMessage(null); // an earlier "recorded" must not stand above this try's errors
    // Anything typed that is not a number stops here; nothing else is ever sent in its place.
    const numbers = parseNumberInputs({ bags: [bags, NUMBER_SPECS.haulBags], weightKg: [weight, NUMBER_SPECS.haulWeightKg] });
    const parsed = haulInputSchema.safeParse({ dropPointId, bags: numbers.values.bags, weightKg: numbers.values.weightKg });
    const found = { ...(parsed.success ? {} : fieldErrorsOf(parsed.error)), ...numbers.errors };
    if (!parsed.success || Object.keys(numbers.errors).length > 0) {
      setErrors(found as Record<string, string>);
      return;
    }
    setErrors({});
    setPending(true);
    const name = dropPoints.find((p) => p.id === dropPointId)?.name ?? "drop point";
    settle(await submit(`/api/drives/${driveId}/hauls`, parsed.data, `Haul: ${countOf(parsed.data.bags, "bag")} from ${name}`));
  }

  async function answerYes() {
    if (!ask) return;
    setPending(true);
    settle(await ask.confirm());
  }

  function settle(result: SubmitResult) {
    setPending(false);
    setAsk(null);
    if (result.kind === "refused" && result.question && result.confirm) return setAsk({ question: result.question, confirm: result.confirm });
    if (result.kind === "refused") return setMessage({ tone: "error", text: result.message });
    setBags("1");
    setWeight("");
    if (result.kind === "queued") return setMessage({ tone: "info", text: result.message });
    const body = result.body as { estimatedCans: number; estimate: { countedHauls: number } };
    setMessage({
      tone: "good",
      text: `Haul recorded: about ${countOf(body.estimatedCans, "can")} (an estimate${body.estimate.countedHauls ? `, from ${countOf(body.estimate.countedHauls, "counted haul")}` : ""}; the sort will count them).`,
    });
  }

  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="Log a haul" noValidate>
      <HaulCaution />
      <SelectField
        id="haul-drop-point"
        label="Drop point"
        value={dropPointId}
        onChange={(e) => setDropPointId(e.target.value)}
        error={errors.dropPointId}
        placeholder="Choose where you picked up…"
        options={dropPoints.map((p) => ({ value: p.id, label: p.name }))}
      />
      <NumberField id="haul-bags" label="Bags" spec={NUMBER_SPECS.haulBags} steppers value={bags} onChange={edit("bags", setBags)} error={errors.bags} />
      <NumberField
        id="haul-weight"
        label="Weight in kg (optional)"
        hint="Net weight of the cans if you weighed them; it gives a better estimate."
        spec={NUMBER_SPECS.haulWeightKg}
        value={weight}
        onChange={edit("weightKg", setWeight)}
        error={errors.weightKg}
      />
      {ask ? <ConfirmUnusual question={ask.question} pending={pending} onYes={() => void answerYes()} onNo={() => setAsk(null)} /> : null}
      {message?.tone === "error" ? <FormError message={message.text} /> : message ? <Notice tone={message.tone === "good" ? "good" : "info"} title={message.text} /> : null}
      <Button type="submit" disabled={pending || ask !== null}>
        {pending ? "Saving…" : "Record haul"}
      </Button>
    </form>
  );
}
