"use client";

import { lazy, Suspense, useActionState, useEffect, useState } from "react";
import { Button, buttonClass } from "@/components/ui/button";
import { FormError, RadioGroup, TextareaField } from "@/components/ui/field";
import { LoadBoundary } from "@/components/ui/load-boundary";
import { IDLE, typed, type ActionState } from "@/lib/api/action-state";
import { fillReportAction } from "@/lib/drives/form-actions";
import { FILL_LEVELS, LEVEL_LABEL } from "@/lib/drives/fill";
import { useBinReported } from "@/hooks/queries/drives";

const FillPhoto = lazy(() => import("./fill-photo").then((m) => ({ default: m.FillPhoto })));
const LEVELS = FILL_LEVELS.map((l) => ({ value: String(l), label: LEVEL_LABEL[l] }));

// "Is this bin full?" is a native disclosure holding a plain form that posts to
// a server action, so it opens and a report is sent even before (or without)
// the page's JavaScript; it stays open on the page that comes back with the
// answer. The photo picker needs the upload client: it is fetched (FillPhoto)
// only once React runs and someone opens the form.
export function FillReportForm({ slug, pointId, pointName, onDone }: { slug: string; pointId: string; pointName: string; onDone: () => void }) {
  const point = { id: pointId, name: pointName };
  const [state, send, pending] = useActionState<ActionState<{ id: string }>, FormData>(fillReportAction, IDLE);
  // Set only once React runs and the disclosure is open, so it is false on the server.
  const [opened, setOpened] = useState(false);
  const binReported = useBinReported(slug);
  const reportId = state.ok ? state.data?.id : undefined;
  const formId = `report-${point.id}`;
  useEffect(() => {
    if (reportId) binReported();
  }, [reportId, binReported]);

  return (
    <details
      className="mt-2"
      open={state.ok !== null || undefined}
      onToggle={(e) => e.currentTarget.open && setOpened(true)}
      // Opened before this code arrived: the toggle event has been and gone.
      ref={(el) => {
        if (el?.open) setOpened(true);
      }}
    >
      <summary aria-label={`Is this bin full? Report how full the bin at ${point.name} is`} className={buttonClass("quiet", "mb-2 w-fit cursor-pointer list-none")}>
        Is this bin full?
      </summary>
      <div className="flex flex-col gap-2 rounded-lg bg-paper-deep p-3">
        {reportId ? (
          <p role="status" className="font-semibold text-moss-deep">Thanks — the organisers can see your report.</p>
        ) : (
          <form id={formId} action={send} noValidate aria-label={`How full is the bin at ${point.name}?`} className="flex flex-col gap-2">
            <input type="hidden" name="slug" value={slug} />
            <input type="hidden" name="pointId" value={point.id} />
            <RadioGroup id={`level-${point.id}`} name="level" label={`How full is the bin at ${point.name}?`} options={LEVELS} defaultValue={typed(state, "level")} error={state.fields.level} />
            <TextareaField id={`note-${point.id}`} name="note" label="Anything else? (optional)" maxLength={500} rows={2} defaultValue={typed(state, "note")} error={state.fields.note} />
          </form>
        )}
        {opened ? (
          <LoadBoundary what="photo picker">
            <Suspense fallback={null}>
              <FillPhoto pointId={point.id} reportId={reportId} />
            </Suspense>
          </LoadBoundary>
        ) : null}
        <FormError message={state.ok === false && !state.fields.level ? state.message : null} />
        <div className="flex flex-wrap gap-2">
          {reportId ? null : <Button type="submit" form={formId} disabled={pending}>{pending ? "Sending…" : "Send report"}</Button>}
          {opened ? <Button type="button" variant="secondary" onClick={onDone}>{reportId ? "Close" : "Cancel"}</Button> : null}
        </div>
      </div>
    </details>
  );
}
