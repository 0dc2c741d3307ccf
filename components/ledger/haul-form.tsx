"use client";

import { useState } from "react";
import { SelectField } from "@/components/ui/field";
import { NumberField } from "@/components/ui/number-field";
import { fieldErrorsOf } from "@/lib/api/errors";
import { ledgerSchemas, schemasOr, useLazySchemas } from "@/hooks/use-lazy-schemas";
import { HaulCaution } from "./cautions";
import { EntryActions, useEntrySubmit, type Submit } from "./entry-submit";
import { NUMBER_SPECS, parseNumberInputs } from "@/lib/forms/number-input";
import { countOf } from "@/lib/plural";
import { weightEntry } from "@/lib/format/weight-entry";
import { useFormat } from "@/hooks/use-look";

export function HaulForm({ driveId, dropPoints, initialDropPointId, submit }: { driveId: string; dropPoints: { id: string; name: string }[]; initialDropPointId?: string; submit: Submit }) {
  const [dropPointId, setDropPointId] = useState(dropPoints.some((p) => p.id === initialDropPointId) ? initialDropPointId! : "");
  const [bags, setBags] = useState("1");
  const [weight, setWeight] = useState("");
  const [errors, setErrors] = useState<Record<string, string>>({});
  const { send, clear: clearStatus, refuse, status } = useEntrySubmit();
  const schemas = useLazySchemas(ledgerSchemas);
  const weighed = weightEntry(useFormat().look.units); // typed in the group's units, sent in kg

  // A box's old error goes once it is edited; what is typed then speaks for itself.
  const edit = (key: string, set: (raw: string) => void) => (raw: string) => {
    set(raw);
    setErrors(({ [key]: _gone, ...rest }) => rest);
  };

  async function onSubmit(e: React.FormEvent) {
    e.preventDefault();
    clearStatus(); // an earlier "recorded" must not stand above this try's errors
    // Anything typed that is not a number stops here; nothing else is ever sent in its place.
    const numbers = parseNumberInputs({ bags: [bags, NUMBER_SPECS.haulBags], weightKg: [weight, weighed.spec] });
    const checks = await schemasOr(schemas, refuse);
    if (!checks) return;
    const parsed = checks.haulInputSchema.safeParse({ dropPointId, bags: numbers.values.bags, weightKg: weighed.toKg(numbers.values.weightKg) });
    const found = { ...(parsed.success ? {} : fieldErrorsOf(parsed.error)), ...numbers.errors };
    if (!parsed.success || Object.keys(numbers.errors).length > 0) {
      setErrors(found as Record<string, string>);
      return;
    }
    setErrors({});
    const name = dropPoints.find((p) => p.id === dropPointId)?.name ?? "drop point";
    await send(
      () => submit(`/api/drives/${driveId}/hauls`, parsed.data, `Haul: ${countOf(parsed.data.bags, "bag")} from ${name}`),
      (result) => {
        setBags("1");
        setWeight("");
        if (result.kind === "queued") return result.message;
        const body = result.body as { estimatedCans: number; estimate: { countedHauls: number } };
        return `Haul recorded: about ${countOf(body.estimatedCans, "can")} (an estimate${body.estimate.countedHauls ? `, from ${countOf(body.estimate.countedHauls, "counted haul")}` : ""}; the sort will count them).`;
      },
    );
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
        label={`Weight in ${weighed.unit} (optional)`}
        hint="Net weight of the cans if you weighed them; it gives a better estimate."
        spec={weighed.spec}
        value={weight}
        onChange={edit("weightKg", setWeight)}
        error={errors.weightKg}
      />
      <EntryActions status={status} label="Record haul" />
    </form>
  );
}
