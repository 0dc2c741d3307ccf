"use client";

import { useMutation } from "@tanstack/react-query";
import { useEffect, useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError } from "@/components/ui/field";
import { fetchJson, ApiError, fieldErrors } from "@/lib/api/client";
import { NUMBER_SPECS, parseNumberInput } from "@/lib/forms/number-input";
import { LIVE, WAITING } from "./pledge-gate";

type Values = { name: string; email: string; dropPointId: string; bags: string; bringOn: string };
const START: Values = { name: "", email: "", dropPointId: "", bags: "1", bringOn: "" };

// Loaded lazily by PledgeSlot, which server-renders it. The inputs are
// uncontrolled (read on submit), so text typed before this code arrived is kept.
export function PledgeForm({ slug, points }: { slug: string; points: { id: string; name: string }[] }) {
  const form = useRef<HTMLFormElement>(null);
  const [values, setValues] = useState<Values>(START);
  const [done, setDone] = useState<{ mailed: boolean } | null>(null);
  const mutation = useMutation({
    mutationFn: (body: unknown) => fetchJson<{ id: string; mailed: boolean }>(`/api/public/drives/${slug}/pledges`, { method: "POST", body }),
    onSuccess: (r) => setDone({ mailed: r.mailed }),
  });
  // Checked by the server with the pledge schema: its 422 field errors show
  // next to the fields. (Keeping zod out of this public page keeps it light.)
  // The bags box is read on submit like the rest (uncontrolled, see above), with the app's one number rule.
  const [bagsError, setBagsError] = useState<string | undefined>(undefined);
  const errors: Record<string, string | undefined> = { ...fieldErrors(mutation.error), ...(bagsError ? { bags: bagsError } : {}) };

  useEffect(() => {
    const el = form.current;
    if (!el) return;
    el.dataset[LIVE] = "true";
    if (el.dataset[WAITING]) {
      delete el.dataset[WAITING];
      el.requestSubmit();
    }
  }, [done]);

  function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const data = new FormData(e.currentTarget);
    const read = (k: keyof Values) => String(data.get(k) ?? "");
    const next: Values = { name: read("name"), email: read("email"), dropPointId: read("dropPointId"), bags: read("bags"), bringOn: read("bringOn") };
    setValues(next);
    const bags = parseNumberInput(next.bags, NUMBER_SPECS.pledgeBags);
    setBagsError(bags.ok ? undefined : bags.error);
    if (!bags.ok) return;
    mutation.mutate({ ...next, bags: bags.value });
  }

  if (done) {
    return (
      <div role="status" className="flex flex-col gap-2">
        <p className="font-semibold text-moss-deep">Thank you — your pledge is in.</p>
        {done.mailed ? <p>We sent a confirmation to {values.email}.</p> : null}
        <Button variant="secondary" onClick={() => { setDone(null); mutation.reset(); }}>
          Pledge more
        </Button>
      </div>
    );
  }

  return (
    <form ref={form} onSubmit={submit} noValidate className="flex flex-col gap-2" aria-label="Pledge cans">
      <p className="text-sm text-ink-soft">Tell us roughly what you will bring, so we can empty bins in time. Name and e-mail are optional and never shown publicly.</p>
      {mutation.error && !(mutation.error instanceof ApiError && Object.keys(mutation.error.fields).length) ? <FormError message={mutation.error.message} /> : null}
      <div className="flex flex-col gap-1">
        <label htmlFor="pledge-point" className="font-semibold">Drop point</label>
        <select
          id="pledge-point"
          name="dropPointId"
          defaultValue={values.dropPointId}
          aria-describedby="pledge-point-error"
          aria-invalid={errors.dropPointId ? true : undefined}
          className={`min-h-11 rounded-lg border-2 bg-white px-3 py-2 ${errors.dropPointId ? "border-alarm" : "border-ink/40"}`}
        >
          <option value="">Choose a drop point…</option>
          {points.map((p) => (
            <option key={p.id} value={p.id}>{p.name}</option>
          ))}
        </select>
        <p id="pledge-point-error" aria-live="polite" className="text-sm font-semibold text-alarm">{errors.dropPointId ?? ""}</p>
      </div>
      <div className="grid gap-2 sm:grid-cols-2">
        <Field id="pledge-bags" name="bags" label="About how many bags" type="text" inputMode="numeric" autoComplete="off" defaultValue={values.bags} error={errors.bags} />
        <Field id="pledge-when" name="bringOn" label="When you will bring them" type="date" defaultValue={values.bringOn} error={errors.bringOn} />
        <Field id="pledge-name" name="name" label="Your name (optional)" autoComplete="name" defaultValue={values.name} error={errors.name} />
        <Field id="pledge-email" name="email" label="E-mail for a confirmation (optional)" type="email" autoComplete="email" defaultValue={values.email} error={errors.email} />
      </div>
      <Button type="submit" disabled={mutation.isPending}>{mutation.isPending ? "Sending…" : "Send my pledge"}</Button>
    </form>
  );
}
