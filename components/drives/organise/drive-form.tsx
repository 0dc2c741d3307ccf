"use client";

import { useActionState, useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError, TextareaField } from "@/components/ui/field";
import { IDLE, type ActionState } from "@/lib/api/action-state";
import { createDriveAction, updateDriveAction } from "@/lib/drives/form-actions";
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

const EMPTY: DriveFormValues = { name: "", slug: "", startsOn: "", endsOn: "", isPublic: true, description: "", wanted: "" };

/** What was typed, when the page comes back from a refused post without JavaScript. */
function typedValues(state: ActionState<unknown>): DriveFormValues | null {
  if (state.ok !== false) return null;
  const v = state.values;
  return { ...EMPTY, ...v, isPublic: "isPublic" in v };
}

// A plain form posting to a server action (new: createDriveAction, which opens
// the new drive's page; edit: updateDriveAction). It works before JavaScript;
// with it, the web address follows the name until edited by hand.
export function DriveForm({ driveId, initial }: { driveId?: string; initial?: DriveFormValues }) {
  const [state, send, pending] = useActionState<ActionState<unknown>, FormData>(driveId ? updateDriveAction : createDriveAction, IDLE);
  const [values, setValues] = useState<DriveFormValues>(() => typedValues(state) ?? initial ?? EMPTY);
  const [slugTouched, setSlugTouched] = useState(Boolean(initial));
  // The answer the last edit came after: "Saved." shows only until the next change.
  const [editedAfter, setEditedAfter] = useState<unknown>(null);
  const errors = state.fields;
  const text = (k: keyof DriveFormValues) => (e: React.ChangeEvent<HTMLInputElement | HTMLTextAreaElement>) => {
    const next = { ...values, [k]: e.target.value };
    if (k === "name" && !slugTouched) next.slug = toSlug(e.target.value, 80);
    if (k === "slug") setSlugTouched(true);
    setEditedAfter(state);
    setValues(next);
  };
  const saved = state.ok === true && editedAfter !== state;

  return (
    <form action={send} noValidate className="flex flex-col gap-2" aria-label={driveId ? "Edit drive" : "New drive"}>
      {driveId ? <input type="hidden" name="id" value={driveId} /> : null}
      <FormError message={state.ok === false ? state.message : null} />
      <Field id="drive-name" name="name" label="Name" value={values.name} onChange={text("name")} error={errors.name} />
      <Field id="drive-slug" name="slug" label="Web address" hint={`The public page will be /drives/${values.slug || "…"}`} value={values.slug} onChange={text("slug")} error={errors.slug} />
      <div className="grid gap-2 sm:grid-cols-2">
        <Field id="drive-starts" name="startsOn" label="Starts on" type="date" value={values.startsOn} onChange={text("startsOn")} error={errors.startsOn} />
        <Field id="drive-ends" name="endsOn" label="Ends on" type="date" value={values.endsOn} onChange={text("endsOn")} error={errors.endsOn} />
      </div>
      <label className="flex min-h-11 items-center gap-2 font-semibold">
        <input type="checkbox" name="isPublic" className="h-5 w-5" checked={values.isPublic} onChange={(e) => setValues({ ...values, isPublic: e.target.checked })} />
        Show a public page for this drive
      </label>
      <TextareaField id="drive-description" name="description" label="Description" rows={3} value={values.description} onChange={text("description")} error={errors.description} />
      <TextareaField
        id="drive-wanted"
        name="wanted"
        label="What else donors should know about the cans"
        hint="The public page always lists standard 355 mL aluminium cans, undented, not crushed, rinsed; and no slim, tall or steel cans. Add anything specific to this drive."
        rows={2}
        value={values.wanted}
        onChange={text("wanted")}
        error={errors.wanted}
      />
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={pending}>{pending ? "Saving…" : driveId ? "Save drive" : "Create drive"}</Button>
        {saved ? <span role="status" className="font-semibold text-moss-deep">Saved.</span> : null}
      </div>
    </form>
  );
}
