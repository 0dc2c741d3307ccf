"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError, SelectField } from "@/components/ui/field";
import { fieldErrors } from "@/lib/api/client";
import type { CanGridInput } from "@/lib/heaters/schemas";
import { useCreateHeater } from "@/hooks/queries/heaters";
import { useRememberDrive } from "@/hooks/queries/current-drive";
import { DriveBanner } from "@/components/drives/drive-banner";
import type { DriveSpan } from "@/lib/drives/current-drive";

/** The group's drives, the one to open on (remembered, else running today) and the group's day. */
export interface DriveChoice {
  drives: DriveSpan[];
  initialId: string | null;
  today: string;
}

/** Saves the chosen plan as a heater unit counted against one of the group's drives. */
export function SavePlan({ input, choice, planLabel, disabled }: { input: CanGridInput; choice: DriveChoice; planLabel: string; disabled: boolean }) {
  const { drives, today } = choice;
  const router = useRouter();
  const [name, setName] = useState("");
  const [driveId, setDriveId] = useState(choice.initialId ?? drives[0]?.id ?? "");
  const remembered = useRememberDrive();
  const drive = drives.find((d) => d.id === driveId);
  const save = useCreateHeater({ onSuccess: (unit) => router.push(`/units/${unit.id}`) });
  const fields = fieldErrors(save.error);
  if (drives.length === 0) {
    return <p className="text-ink-soft">Your group has no drive yet. An organiser sets one up first; then save the plan to it.</p>;
  }
  return (
    <form
      className="flex flex-col gap-2"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        save.mutate({ name, driveId, plan: input });
      }}
    >
      <FormError message={save.error ? (Object.keys(fields).length ? "Some fields need another look." : save.error.message) : null} />
      <p className="text-ink-soft">Saves {planLabel} with the settings above.</p>
      <Field id="unit-name" label="Unit name" hint="The room or building it will warm" value={name} error={fields.name} onChange={(e) => setName(e.target.value)} required />
      <SelectField
        id="unit-drive"
        label="Count it against the drive"
        value={driveId}
        onChange={(e) => {
          setDriveId(e.target.value);
          remembered.remember(e.target.value);
        }}
        error={fields.driveId}
        options={drives.map((d) => ({ value: d.id, label: d.name }))}
      />
      {drive ? <DriveBanner drive={drive} today={today} lead="Counting it against" rememberError={remembered.error} /> : null}
      {Object.entries(fields)
        .filter(([k]) => k.startsWith("plan."))
        .map(([k, v]) => (
          <p key={k} className="text-sm font-semibold text-alarm">{v}</p>
        ))}
      <Button type="submit" disabled={disabled || save.isPending}>{save.isPending ? "Saving…" : "Save as a heater unit"}</Button>
    </form>
  );
}
