"use client";

import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError } from "@/components/ui/field";
import { fetchJson, ApiError, fieldErrors } from "@/lib/api/client";
import { fieldErrorsOf } from "@/lib/api/errors";
import { driveInput } from "@/lib/drives/schemas";
import { toSlug } from "@/lib/slug";

export interface DriveFormValues {
  name: string;
  slug: string;
  startsOn: string;
  endsOn: string;
  isPublic: boolean;
  description: string;
  wanted: string;
}


export function DriveForm({ driveId, initial }: { driveId?: string; initial?: DriveFormValues }) {
  const router = useRouter();
  const [values, setValues] = useState<DriveFormValues>(
    initial ?? { name: "", slug: "", startsOn: "", endsOn: "", isPublic: true, description: "", wanted: "" },
  );
  const [slugTouched, setSlugTouched] = useState(Boolean(initial));
  const [local, setLocal] = useState<Record<string, string>>({});
  const [saved, setSaved] = useState(false);
  const mutation = useMutation({
    mutationFn: (body: unknown) =>
      fetchJson<{ id: string }>(driveId ? `/api/drives/${driveId}` : "/api/drives", { method: driveId ? "PUT" : "POST", body }),
    onSuccess: (r) => {
      if (driveId) {
        setSaved(true);
        router.refresh();
      } else router.push(`/organise/drives/${r.id}`);
    },
  });
  const errors = { ...fieldErrors(mutation.error), ...local };
  const text = (k: keyof DriveFormValues) => (e: React.ChangeEvent<HTMLInputElement | HTMLTextAreaElement>) => {
    const next = { ...values, [k]: e.target.value };
    if (k === "name" && !slugTouched) next.slug = toSlug(e.target.value, 80);
    if (k === "slug") setSlugTouched(true);
    setSaved(false);
    setValues(next);
  };

  function submit(e: React.FormEvent) {
    e.preventDefault();
    const parsed = driveInput.safeParse(values);
    if (!parsed.success) return setLocal(fieldErrorsOf(parsed.error));
    setLocal({});
    mutation.mutate(parsed.data);
  }

  const generalError = mutation.error && !(mutation.error instanceof ApiError && Object.keys(mutation.error.fields).length) ? mutation.error.message : null;
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-2" aria-label={driveId ? "Edit drive" : "New drive"}>
      <FormError message={generalError ?? (Object.keys(errors).length ? "Some fields need another look." : null)} />
      <Field id="drive-name" label="Name" value={values.name} onChange={text("name")} error={errors.name} />
      <Field id="drive-slug" label="Web address" hint={`The public page will be /drives/${values.slug || "…"}`} value={values.slug} onChange={text("slug")} error={errors.slug} />
      <div className="grid gap-2 sm:grid-cols-2">
        <Field id="drive-starts" label="Starts on" type="date" value={values.startsOn} onChange={text("startsOn")} error={errors.startsOn} />
        <Field id="drive-ends" label="Ends on" type="date" value={values.endsOn} onChange={text("endsOn")} error={errors.endsOn} />
      </div>
      <label className="flex min-h-11 items-center gap-2 font-semibold">
        <input type="checkbox" className="h-5 w-5" checked={values.isPublic} onChange={(e) => setValues({ ...values, isPublic: e.target.checked })} />
        Show a public page for this drive
      </label>
      <label htmlFor="drive-description" className="font-semibold">Description</label>
      <textarea id="drive-description" rows={3} value={values.description} onChange={text("description")} className="rounded-lg border-2 border-ink/40 bg-white px-3 py-2" />
      <p className="text-sm font-semibold text-alarm">{errors.description ?? ""}</p>
      <label htmlFor="drive-wanted" className="font-semibold">What else donors should know about the cans</label>
      <p id="drive-wanted-hint" className="text-sm text-ink-faint">The public page always lists standard 355 mL aluminium cans, undented, not crushed, rinsed; and no slim, tall or steel cans. Add anything specific to this drive.</p>
      <textarea id="drive-wanted" aria-describedby="drive-wanted-hint" rows={2} value={values.wanted} onChange={text("wanted")} className="rounded-lg border-2 border-ink/40 bg-white px-3 py-2" />
      <p className="text-sm font-semibold text-alarm">{errors.wanted ?? ""}</p>
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={mutation.isPending}>{mutation.isPending ? "Saving…" : driveId ? "Save drive" : "Create drive"}</Button>
        {saved ? <span role="status" className="font-semibold text-moss-deep">Saved.</span> : null}
      </div>
    </form>
  );
}
