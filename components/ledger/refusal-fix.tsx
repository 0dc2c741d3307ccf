"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { NumberField } from "@/components/ui/number-field";
import { fixBoxes, fixableFields, parseFix } from "@/lib/offline/fix";
import { useFormat } from "@/hooks/use-look";
import type { Refusal } from "./use-outbox";

/** How the server's field names read to a volunteer (the numbers' own labels are in FIXABLE). */
const OTHER_FIELDS: Record<string, string> = { happenedAt: "Time entered", dropPointId: "Drop point", haulIds: "Hauls", reason: "Reason", rejected: "Rejected cans" };

/**
 * "Fix it" on an entry the server refused after it waited on the phone: its numbers in boxes
 * (those the server named first, with its words), sent again with the time it was entered.
 */
export function RefusalFix({ refusal, onFix }: { refusal: Refusal; onFix: (key: string, values: Record<string, number | null>) => Promise<void> }) {
  const { units } = useFormat().look;
  const boxes = fixBoxes(units);
  const keys = fixableFields(refusal.item.body, refusal.fields);
  const body = (refusal.item.body ?? {}) as Record<string, unknown>;
  const [open, setOpen] = useState(false);
  // Each box shows the entry's number in the group's units (a weight in lb where the group weighs in pounds).
  const [raw, setRaw] = useState<Record<string, string>>(() => Object.fromEntries(keys.map((k) => [k, typeof body[k] === "number" ? String(boxes[k]!.shown(body[k])) : ""])));
  const [errors, setErrors] = useState<Record<string, string>>(refusal.fields ?? {});
  const [sending, setSending] = useState(false);
  const said = Object.entries(refusal.fields ?? {});
  // What the server said about each field, in words ("Some fields need another look" alone says nothing).
  const details = said.length ? (
    <ul className="w-full list-disc pl-5 text-sm">
      {said.map(([k, why]) => (
        <li key={k}>
          {boxes[k]?.label ?? OTHER_FIELDS[k] ?? "Entry"}: {why}
        </li>
      ))}
    </ul>
  ) : null;
  if (keys.length === 0) return details;
  if (!open) {
    return (
      <>
        {details}
        <Button type="button" variant="secondary" onClick={() => setOpen(true)}>
          Fix it
        </Button>
      </>
    );
  }
  return (
    <form
      aria-label={`Fix ${refusal.label}`}
      className="mt-2 flex flex-col gap-2"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        const parsed = parseFix(raw, units);
        if (!parsed.ok) return setErrors(parsed.errors);
        setSending(true);
        void onFix(refusal.key, parsed.values).finally(() => setSending(false));
      }}
    >
      {details}
      {keys.map((k) => (
        <NumberField
          key={k}
          id={`fix-${refusal.key}-${k}`}
          label={boxes[k]!.label}
          spec={boxes[k]!.spec}
          value={raw[k] ?? ""}
          error={errors[k]}
          onChange={(v) => {
            setRaw((r) => ({ ...r, [k]: v }));
            setErrors(({ [k]: _gone, ...rest }) => rest);
          }}
        />
      ))}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" disabled={sending}>
          {sending ? "Sending…" : "Send again"}
        </Button>
        <Button type="button" variant="quiet" onClick={() => setOpen(false)}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
