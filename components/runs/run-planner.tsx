"use client";

import { useQuery } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";
import { Button } from "@/components/ui/button";
import { Card, Skeleton } from "@/components/ui/card";
import { DriveBanner } from "@/components/drives/drive-banner";
import { useFormat } from "@/hooks/use-look";
import { Field, FormError, SelectField } from "@/components/ui/field";
import { fieldErrors } from "@/lib/api/client";
import { fieldErrorsOf } from "@/lib/api/errors";
import { runSchemas, schemasOr, useLazySchemas } from "@/hooks/use-lazy-schemas";
import { runQueries, useCreateRun } from "@/hooks/queries/runs";
import type { SuggestionRow } from "@/lib/runs/types";
import { useRememberDrive } from "@/hooks/queries/current-drive";
import type { DriveSpan } from "@/lib/drives/current-drive";
import { StopPicker } from "./stop-picker";
import { RoutePreview } from "./route-preview";

export interface PlannerProps {
  drives: DriveSpan[];
  initialDriveId: string;
  /** The group's day, for the warning when the drive is not running. */
  today: string;
  initialSuggestions: SuggestionRow[];
  workshop: { lat: number; lng: number } | null;
  drivers: { id: string; name: string; role: string }[];
  defaultDate: string;
  tileUrl: string;
  attribution: string;
}


export function RunPlanner(props: PlannerProps) {
  const router = useRouter();
  const [driveId, setDriveId] = useState(props.initialDriveId);
  const schemas = useLazySchemas(runSchemas);
  const remembered = useRememberDrive();
  const { look } = useFormat();
  const drive = props.drives.find((d) => d.id === driveId) ?? props.drives[0];
  const suggestions = useQuery({
    ...runQueries.suggestions(driveId),
    initialData: driveId === props.initialDriveId ? props.initialSuggestions : undefined,
  });
  const [selection, setSelection] = useState({ driveId: props.initialDriveId, ids: new Set(props.initialSuggestions.filter((s) => s.suggested).map((s) => s.id)) });
  // A new drive's suggestions replace the choice once they arrive.
  if (selection.driveId !== driveId && suggestions.data) {
    setSelection({ driveId, ids: new Set(suggestions.data.filter((s) => s.suggested).map((s) => s.id)) });
  }
  const [lat, setLat] = useState(props.workshop ? String(props.workshop.lat) : "");
  const [lng, setLng] = useState(props.workshop ? String(props.workshop.lng) : "");
  const [returnToStart, setReturnToStart] = useState(false);
  const [plannedOn, setPlannedOn] = useState(props.defaultDate);
  const [assigneeId, setAssigneeId] = useState("");
  const [notes, setNotes] = useState("");
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [missing, setMissing] = useState<string | null>(null);

  const start = useMemo(() => {
    const a = Number(lat);
    const b = Number(lng);
    return lat.trim() && lng.trim() && Number.isFinite(a) && Number.isFinite(b) && Math.abs(a) <= 90 && Math.abs(b) <= 180 ? { lat: a, lng: b } : null;
  }, [lat, lng]);
  const chosen = (suggestions.data ?? []).filter((s) => selection.ids.has(s.id));

  const create = useCreateRun({ onSuccess: (run) => router.push(`/runs/${run.id}`), onError: (error) => setErrors(fieldErrors(error)) });

  async function submit(event: React.FormEvent) {
    event.preventDefault();
    const body = {
      driveId,
      plannedOn,
      start: { lat: lat.trim() === "" ? undefined : Number(lat), lng: lng.trim() === "" ? undefined : Number(lng) },
      returnToStart,
      dropPointIds: chosen.map((s) => s.id),
      assigneeId,
      notes,
    };
    setMissing(null);
    const checks = await schemasOr(schemas, setMissing);
    if (!checks) return;
    const parsed = checks.createRunInputSchema.safeParse(body);
    if (!parsed.success) return setErrors(fieldErrorsOf(parsed.error));
    setErrors({});
    create.mutate(parsed.data);
  }

  const toggle = (id: string) =>
    setSelection((s) => {
      const ids = new Set(s.ids);
      if (ids.has(id)) ids.delete(id);
      else ids.add(id);
      return { ...s, ids };
    });

  return (
    <form onSubmit={submit} noValidate className="grid gap-6 lg:grid-cols-2">
      <div className="flex flex-col gap-4">
        <Card title="1. Drive and stops">
          <SelectField
            id="drive"
            label="Drive"
            value={driveId}
            onChange={(e) => {
              setDriveId(e.target.value);
              remembered.remember(e.target.value);
            }}
            options={props.drives.map((d) => ({ value: d.id, label: d.name }))}
          />
          {drive ? (
            <div className="mt-3">
              <DriveBanner drive={drive} today={props.today} lead="Planning for" rememberError={remembered.error} look={look} />
            </div>
          ) : null}
          <div className="mt-4">
            {suggestions.isPending ? (
              <Skeleton className="h-40 w-full" />
            ) : suggestions.isError ? (
              <p role="alert" className="font-semibold text-alarm">{suggestions.error.message}</p>
            ) : suggestions.data.length === 0 ? (
              <p className="text-ink-soft">This drive has no active drop points. Add drop points to the drive first.</p>
            ) : (
              <StopPicker suggestions={suggestions.data} selected={selection.ids} onToggle={toggle} error={errors.dropPointIds} plannedOn={plannedOn} />
            )}
          </div>
        </Card>
        <Card title="2. Start, day and volunteer">
          <p className="mb-2 text-sm text-ink-faint">Starts at the group&apos;s workshop; change it if the run starts elsewhere.</p>
          <div className="grid grid-cols-2 gap-3">
            <Field id="start-lat" label="Start latitude" inputMode="decimal" value={lat} onChange={(e) => setLat(e.target.value)} error={errors["start.lat"] ?? errors.start} />
            <Field id="start-lng" label="Start longitude" inputMode="decimal" value={lng} onChange={(e) => setLng(e.target.value)} error={errors["start.lng"]} />
          </div>
          <label className="mt-1 flex min-h-11 items-center gap-2">
            <input type="checkbox" className="h-5 w-5 accent-ember" checked={returnToStart} onChange={(e) => setReturnToStart(e.target.checked)} />
            Come back to the start at the end
          </label>
          <Field id="planned-on" className="mt-3" label="Day of the run" type="date" value={plannedOn} onChange={(e) => setPlannedOn(e.target.value)} error={errors.plannedOn} />
          <SelectField
            id="assignee"
            label="Volunteer"
            value={assigneeId}
            onChange={(e) => setAssigneeId(e.target.value)}
            error={errors.assigneeId}
            placeholder="Choose who drives it…"
            options={props.drivers.map((d) => ({ value: d.id, label: `${d.name} (${d.role})` }))}
          />
          <Field id="notes" label="Notes for the volunteer (optional)" value={notes} onChange={(e) => setNotes(e.target.value)} error={errors.notes} />
        </Card>
      </div>
      <div className="flex flex-col gap-4">
        <Card title="3. Route">
          <RoutePreview start={start} stops={chosen} returnToStart={returnToStart} tileUrl={props.tileUrl} attribution={props.attribution} />
        </Card>
        <FormError message={missing ?? (create.isError ? create.error.message : Object.keys(errors).length ? "Some fields need another look." : null)} />
        <Button type="submit" disabled={create.isPending}>
          {create.isPending ? "Saving the run…" : "Plan this run and tell the volunteer"}
        </Button>
      </div>
    </form>
  );
}
