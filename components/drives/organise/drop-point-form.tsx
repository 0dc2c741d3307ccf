"use client";

import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError } from "@/components/ui/field";
import { fetchJson, ApiError, fieldErrors } from "@/lib/api/client";
import { fieldErrorsOf } from "@/lib/api/errors";
import { dropPointInput } from "@/lib/drives/schemas";
import { NumberField } from "@/components/ui/number-field";
import { NUMBER_SPECS, parseNumberInput } from "@/lib/forms/number-input";

export interface DropPointValues {
  name: string;
  address: string;
  lat: string;
  lng: string;
  hours: string;
  hostName: string;
  hostPhone: string;
  hostEmail: string;
  capacityBags: string;
  active: boolean;
}

export const emptyDropPoint = (lat = "", lng = ""): DropPointValues => ({
  name: "", address: "", lat, lng, hours: "", hostName: "", hostPhone: "", hostEmail: "", capacityBags: "6", active: true,
});

function toBody(v: DropPointValues) {
  const num = (s: string) => (s.trim() === "" ? undefined : Number(s));
  return { ...v, lat: num(v.lat), lng: num(v.lng) };
}

export function DropPointForm({
  url,
  method,
  values,
  onChange,
  onSaved,
  submitLabel,
}: {
  url: string;
  method: "POST" | "PATCH";
  values: DropPointValues;
  onChange: (v: DropPointValues) => void;
  onSaved: () => void;
  submitLabel: string;
}) {
  const [local, setLocal] = useState<Record<string, string>>({});
  const mutation = useMutation({ mutationFn: (body: unknown) => fetchJson(url, { method, body }), onSuccess: onSaved });
  const errors = { ...fieldErrors(mutation.error), ...local };
  const text = (k: keyof DropPointValues) => (e: React.ChangeEvent<HTMLInputElement>) => onChange({ ...values, [k]: e.target.value });

  function submit(e: React.FormEvent) {
    e.preventDefault();
    const capacity = parseNumberInput(values.capacityBags, NUMBER_SPECS.capacityBags);
    const parsed = dropPointInput.safeParse({ ...toBody(values), capacityBags: capacity.ok ? capacity.value : undefined });
    if (!parsed.success || !capacity.ok) return setLocal({ ...(parsed.success ? {} : fieldErrorsOf(parsed.error)), ...(capacity.ok ? {} : { capacityBags: capacity.error }) });
    setLocal({});
    mutation.mutate(parsed.data);
  }
  const general = mutation.error && !(mutation.error instanceof ApiError && Object.keys(mutation.error.fields).length) ? mutation.error.message : null;

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-2" aria-label={submitLabel}>
      <FormError message={general ?? (Object.keys(errors).length ? "Some fields need another look." : null)} />
      <Field id="dp-name" label="Name" value={values.name} onChange={text("name")} error={errors.name} />
      <Field id="dp-address" label="Address" value={values.address} onChange={text("address")} error={errors.address} />
      <p className="text-sm text-ink-faint">Place it by clicking the map or dragging the pin, or type the coordinates.</p>
      <div className="grid grid-cols-2 gap-2">
        <Field id="dp-lat" label="Latitude" inputMode="decimal" value={values.lat} onChange={text("lat")} error={errors.lat} />
        <Field id="dp-lng" label="Longitude" inputMode="decimal" value={values.lng} onChange={text("lng")} error={errors.lng} />
      </div>
      <Field id="dp-hours" label="Opening hours" placeholder="Mon–Sat 9:00–17:00" value={values.hours} onChange={text("hours")} error={errors.hours} />
      <NumberField
        id="dp-capacity"
        label="Bin holds (bags)"
        spec={NUMBER_SPECS.capacityBags}
        value={values.capacityBags}
        onChange={(raw) => {
          onChange({ ...values, capacityBags: raw });
          setLocal(({ capacityBags: _gone, ...rest }) => rest);
        }}
        error={errors.capacityBags}
      />
      <fieldset className="rounded-lg border border-paper-edge p-3">
        <legend className="px-1 font-semibold">Host contact (organisers only, never public)</legend>
        <Field id="dp-host-name" label="Host name" value={values.hostName} onChange={text("hostName")} error={errors.hostName} />
        <Field id="dp-host-phone" label="Host phone" type="tel" value={values.hostPhone} onChange={text("hostPhone")} error={errors.hostPhone} />
        <Field id="dp-host-email" label="Host e-mail" type="email" value={values.hostEmail} onChange={text("hostEmail")} error={errors.hostEmail} />
      </fieldset>
      <label className="flex min-h-11 items-center gap-2 font-semibold">
        <input type="checkbox" className="h-5 w-5" checked={values.active} onChange={(e) => onChange({ ...values, active: e.target.checked })} />
        Open for drop-offs (untick to pause)
      </label>
      <Button type="submit" disabled={mutation.isPending}>{mutation.isPending ? "Saving…" : submitLabel}</Button>
    </form>
  );
}
