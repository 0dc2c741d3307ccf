"use client";

import { startTransition, useActionState, useEffect, useEffectEvent } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError } from "@/components/ui/field";
import { NumberField } from "@/components/ui/number-field";
import { IDLE, type ActionState } from "@/lib/api/action-state";
import { createDropPointAction, updateDropPointAction } from "@/lib/drives/form-actions";
import { NUMBER_SPECS } from "@/lib/forms/number-input";
import type { OpeningSpan } from "@/lib/drives/opening-hours";
import { OpeningHoursInput } from "./opening-hours-input";

export interface DropPointValues {
  name: string;
  address: string;
  lat: string;
  lng: string;
  hours: string;
  openingHours: OpeningSpan[];
  hostName: string;
  hostPhone: string;
  hostEmail: string;
  capacityBags: string;
  active: boolean;
}

export const emptyDropPoint = (lat = "", lng = ""): DropPointValues => ({
  name: "", address: "", lat, lng, hours: "", openingHours: [], hostName: "", hostPhone: "", hostEmail: "", capacityBags: "6", active: true,
});

// A plain form posting to a server action: createDropPointAction (hidden
// driveId) or updateDropPointAction (hidden id). The values stay in the
// page's state (the map moves the pin too), so nothing typed is lost on a refusal.
export function DropPointForm({
  target,
  values,
  onChange,
  onSaved,
  onRefused,
  submitLabel,
}: {
  target: { driveId: string } | { id: string };
  values: DropPointValues;
  onChange: (v: DropPointValues) => void;
  onSaved: () => void;
  /** A refusal came back: a "Saved." from an earlier answer must not stand under the new error. */
  onRefused?: () => void;
  submitLabel: string;
}) {
  const [state, send, pending] = useActionState<ActionState<unknown>, FormData>("driveId" in target ? createDropPointAction : updateDropPointAction, IDLE);
  const saved = useEffectEvent(onSaved);
  const refused = useEffectEvent(() => onRefused?.());
  useEffect(() => {
    if (state.ok) saved();
    else if (state.ok === false) refused();
  }, [state]);
  const errors = state.fields;
  const text = (k: keyof DropPointValues) => (e: React.ChangeEvent<HTMLInputElement>) => onChange({ ...values, [k]: e.target.value });
  const field = (k: keyof DropPointValues) => ({ name: k, value: (values[k] as string | null) ?? "", onChange: text(k), error: errors[k] });

  return (
    <form
      action={send}
      // With JavaScript the action is sent by hand: React's reset after a form action would clear the
      // controlled checkboxes (opening days, "open") on screen while the state still holds them.
      // Without JavaScript the form posts to the same action as before.
      onSubmit={(e) => {
        e.preventDefault();
        const data = new FormData(e.currentTarget);
        startTransition(() => send(data));
      }}
      noValidate
      className="flex flex-col gap-2"
      aria-label={submitLabel}
    >
      {"driveId" in target ? <input type="hidden" name="driveId" value={target.driveId} /> : <input type="hidden" name="id" value={target.id} />}
      <FormError message={state.ok === false ? state.message : null} />
      <Field id="dp-name" label="Name" {...field("name")} />
      <Field id="dp-address" label="Address" {...field("address")} />
      <p className="text-sm text-ink-faint">Place it by clicking the map or dragging the pin, or type the coordinates.</p>
      <div className="grid grid-cols-2 gap-2">
        <Field id="dp-lat" label="Latitude" inputMode="decimal" {...field("lat")} />
        <Field id="dp-lng" label="Longitude" inputMode="decimal" {...field("lng")} />
      </div>
      <OpeningHoursInput
        value={values.openingHours}
        onChange={(openingHours) => onChange({ ...values, openingHours })}
        error={Object.entries(errors).find(([k]) => k.startsWith("openingHours"))?.[1]}
      />
      <Field id="dp-hours" label="Notes on opening hours" hint="Free text, for example: ring the side bell; closed on bank holidays." {...field("hours")} />
      <NumberField
        id="dp-capacity"
        fieldName="capacityBags"
        label="Bin holds (bags)"
        spec={NUMBER_SPECS.capacityBags}
        value={values.capacityBags}
        onChange={(raw) => onChange({ ...values, capacityBags: raw })}
        error={errors.capacityBags}
      />
      <fieldset className="rounded-lg border border-paper-edge p-3">
        <legend className="px-1 font-semibold">Host contact (organisers only, never public)</legend>
        <Field id="dp-host-name" label="Host name" {...field("hostName")} />
        <Field id="dp-host-phone" label="Host phone" type="tel" {...field("hostPhone")} />
        <Field id="dp-host-email" label="Host e-mail" type="email" {...field("hostEmail")} />
      </fieldset>
      <label className="flex min-h-11 items-center gap-2 font-semibold">
        <input type="checkbox" name="active" className="h-5 w-5" checked={values.active} onChange={(e) => onChange({ ...values, active: e.target.checked })} />
        Open for drop-offs (untick to pause)
      </label>
      <Button type="submit" disabled={pending}>{pending ? "Saving…" : submitLabel}</Button>
    </form>
  );
}
