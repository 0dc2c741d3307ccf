"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError, SelectField, TextareaField } from "@/components/ui/field";
import { fieldErrors } from "@/lib/api/client";
import { useCancelRun, useEditRun, useOptimiseRun, useSetStops } from "@/hooks/queries/runs";
import { STOP_STATUS_LABEL } from "@/lib/runs/schemas";
import type { RunDetail } from "@/lib/runs/types";

export interface DriverChoice {
  id: string;
  name: string;
  role: string;
}

/** An organiser's changes to a run that is not done or cancelled: day, volunteer, notes, stops, cancel. */
export function RunEditor({ run, drivers, dropPoints }: { run: RunDetail; drivers: DriverChoice[]; dropPoints: { id: string; name: string }[] }) {
  return (
    <section aria-labelledby="run-edit-heading" className="flex flex-col gap-4 rounded-card border-2 border-paper-edge bg-white p-4">
      <h2 id="run-edit-heading" className="text-2xl">Change this run</h2>
      <DetailsForm run={run} drivers={drivers} />
      <StopsEditor run={run} dropPoints={dropPoints} />
      <CancelRun run={run} />
    </section>
  );
}

function DetailsForm({ run, drivers }: { run: RunDetail; drivers: DriverChoice[] }) {
  const [plannedOn, setPlannedOn] = useState(run.plannedOn);
  const [assigneeId, setAssigneeId] = useState(run.assigneeId ?? "");
  const [notes, setNotes] = useState(run.notes);
  const [fields, setFields] = useState<Record<string, string>>({});
  const [saved, setSaved] = useState(false);
  const edit = useEditRun(run.id, { onSuccess: () => setSaved(true), onError: (e) => setFields(fieldErrors(e)) });
  return (
    <form
      className="flex flex-col gap-2"
      aria-label="Day, volunteer and notes"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        setFields({});
        setSaved(false);
        // Only what changed: a run with no volunteer yet keeps none until one is chosen.
        edit.mutate({
          ...(plannedOn !== run.plannedOn ? { plannedOn } : {}),
          ...(assigneeId && assigneeId !== run.assigneeId ? { assigneeId } : {}),
          ...(notes !== run.notes ? { notes } : {}),
        });
      }}
    >
      <div className="grid gap-2 sm:grid-cols-2">
        <Field id="run-day" label="Day of the run" type="date" value={plannedOn} onChange={(e) => setPlannedOn(e.target.value)} error={fields.plannedOn} />
        <SelectField
          id="run-driver"
          label="Volunteer"
          hint="Both the new and the previous volunteer get an e-mail."
          value={assigneeId}
          onChange={(e) => setAssigneeId(e.target.value)}
          error={fields.assigneeId}
          placeholder={run.assigneeId ? undefined : "Choose who drives"}
          options={drivers.map((d) => ({ value: d.id, label: `${d.name}${d.role === "organiser" ? " (organiser)" : ""}` }))}
        />
      </div>
      <TextareaField id="run-notes" label="Notes for the volunteer" value={notes} onChange={(e) => setNotes(e.target.value)} error={fields.notes} rows={2} />
      <FormError message={edit.isError ? edit.error.message : null} />
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={edit.isPending}>{edit.isPending ? "Saving…" : "Save the changes"}</Button>
        <p aria-live="polite" className="text-moss-deep">{saved && !edit.isPending ? "Saved." : ""}</p>
      </div>
    </form>
  );
}

function StopsEditor({ run, dropPoints }: { run: RunDetail; dropPoints: { id: string; name: string }[] }) {
  const order = run.stopList.map((s) => s.dropPoint.id);
  const [adding, setAdding] = useState("");
  const [message, setMessage] = useState("");
  const put = useSetStops(run.id, { onSuccess: () => setAdding("") });
  const optimise = useOptimiseRun(run.id, { onSuccess: () => setMessage("Stops still to visit are now in the shortest order.") });
  const busy = put.isPending || optimise.isPending;
  const send = (next: string[], said: string) => {
    setMessage(said);
    put.mutate(next);
  };
  const move = (i: number, by: -1 | 1) => {
    const next = [...order];
    [next[i], next[i + by]] = [next[i + by]!, next[i]!];
    return next;
  };
  const onRun = new Set(order);
  const addable = dropPoints.filter((p) => !onRun.has(p.id));
  const error = put.isError ? put.error.message : optimise.isError ? optimise.error.message : null;
  return (
    <div className="flex flex-col gap-2">
      <h3 className="text-xl">Stops, in visiting order</h3>
      <ol className="flex flex-col gap-2" aria-label="Stops to reorder">
        {run.stopList.map((s, i) => {
          const name = s.dropPoint.name;
          return (
            <li key={s.id} className="flex flex-wrap items-center justify-between gap-2 rounded-lg border border-paper-edge p-2">
              <span className="min-w-0 flex-1">
                <span className="font-semibold">{i + 1}. {name}</span>
                {s.status !== "pending" ? <span className="block text-sm text-ink-faint">{STOP_STATUS_LABEL[s.status]} — stays on the run</span> : null}
              </span>
              <span className="flex gap-1">
                <Button type="button" variant="secondary" className="px-3" disabled={busy || i === 0} aria-label={`Move ${name} up`} onClick={() => send(move(i, -1), `${name} moved up.`)}>↑</Button>
                <Button type="button" variant="secondary" className="px-3" disabled={busy || i === order.length - 1} aria-label={`Move ${name} down`} onClick={() => send(move(i, 1), `${name} moved down.`)}>↓</Button>
                <Button
                  type="button"
                  variant="quiet"
                  className="px-3"
                  disabled={busy || s.status !== "pending" || order.length === 1}
                  aria-label={`Remove ${name} from the run`}
                  onClick={() => send(order.filter((id) => id !== s.dropPoint.id), `${name} removed from the run.`)}
                >
                  Remove
                </Button>
              </span>
            </li>
          );
        })}
      </ol>
      <p aria-live="polite" className="text-sm text-ink-soft">{busy ? "Saving…" : message}</p>
      <FormError message={error} />
      <div className="flex flex-wrap items-end gap-2">
        {addable.length ? (
          <form
            className="flex flex-wrap items-end gap-2"
            aria-label="Add a stop"
            onSubmit={(e) => {
              e.preventDefault();
              const p = addable.find((x) => x.id === adding);
              if (p) send([...order, p.id], `${p.name} added at the end.`);
            }}
          >
            <SelectField id="run-add-stop" label="Add a drop point" value={adding} onChange={(e) => setAdding(e.target.value)} placeholder="Choose a drop point" options={addable.map((p) => ({ value: p.id, label: p.name }))} />
            <Button type="submit" variant="secondary" disabled={busy || !adding} className="mb-1">Add the stop</Button>
          </form>
        ) : null}
        <Button type="button" variant="secondary" disabled={busy} className="mb-1" onClick={() => optimise.mutate()}>Re-optimise the order</Button>
      </div>
    </div>
  );
}

function CancelRun({ run }: { run: RunDetail }) {
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState("");
  const [fields, setFields] = useState<Record<string, string>>({});
  const cancel = useCancelRun(run.id, { onError: (e) => setFields(fieldErrors(e)) });
  if (!open) {
    return (
      <div>
        <Button type="button" variant="quiet" onClick={() => setOpen(true)}>Cancel this run…</Button>
      </div>
    );
  }
  return (
    <form
      className="flex flex-col gap-2 rounded-lg border-2 border-alarm p-3"
      aria-label="Cancel this run"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        setFields({});
        cancel.mutate(reason);
      }}
    >
      <p>
        The run stays in the list as cancelled. Stops not yet visited are released; hauls already logged stay in the records.
        {run.assigneeName ? ` ${run.assigneeName} gets an e-mail.` : ""}
      </p>
      <Field id="run-cancel-reason" label="Why is it cancelled?" value={reason} onChange={(e) => setReason(e.target.value)} error={fields.reason} />
      <FormError message={cancel.isError && !fields.reason ? cancel.error.message : null} />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" variant="danger" disabled={cancel.isPending}>{cancel.isPending ? "Cancelling…" : "Cancel the run"}</Button>
        <Button type="button" variant="secondary" onClick={() => setOpen(false)}>Keep the run</Button>
      </div>
    </form>
  );
}
