"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useActionState, useEffect, useRef, useState, useSyncExternalStore } from "react";
import { Button, buttonClass } from "@/components/ui/button";
import { FormError, RadioGroup, TextareaField } from "@/components/ui/field";
import { IDLE, typed, type ActionState } from "@/lib/api/action-state";
import { fillReportAction } from "@/lib/drives/form-actions";
import { FILL_LEVELS, LEVEL_LABEL } from "@/lib/drives/fill";
import { publicDropPointsQuery } from "@/lib/drives/query-options";
import { PHOTO_ACCEPT, photoProblem } from "@/lib/uploads/photo-rules";

const LEVELS = FILL_LEVELS.map((l) => ({ value: String(l), label: LEVEL_LABEL[l] }));
const noop = () => () => undefined;

// "Is this bin full?" is a native disclosure holding a plain form that posts to
// a server action, so it opens and a report is sent even before (or without)
// the page's JavaScript; it stays open on the page that comes back with the
// answer. The photo needs the upload client: the picker shows once React runs,
// and the client is fetched only when a report with a photo has been stored.
export function FillReportForm(props: { slug: string; point: { id: string; name: string }; onDone: () => void }) {
  const [state, send, pending] = useActionState<ActionState<{ id: string }>, FormData>(fillReportAction, IDLE);
  return (
    <details className="mt-2" open={state.ok !== null || undefined}>
      <summary aria-label={`Report how full the bin at ${props.point.name} is`} className={buttonClass("quiet", "mb-2 w-fit cursor-pointer list-none")}>
        Is this bin full?
      </summary>
      <ReportBody {...props} state={state} send={send} pending={pending} />
    </details>
  );
}

function ReportBody({
  slug,
  point,
  onDone,
  state,
  send,
  pending,
}: {
  slug: string;
  point: { id: string; name: string };
  onDone: () => void;
  state: ActionState<{ id: string }>;
  send: (formData: FormData) => void;
  pending: boolean;
}) {
  const live = useSyncExternalStore(noop, () => true, () => false);
  const [error, setError] = useState<string | null>(null);
  const photo = useRef<File | null>(null);
  const [progress, setProgress] = useState<number | null>(null);
  const [photoNote, setPhotoNote] = useState<string | null>(null);
  const queryClient = useQueryClient();
  const reportId = state.ok ? state.data?.id : undefined;

  useEffect(() => {
    if (!reportId) return;
    void queryClient.invalidateQueries({ queryKey: publicDropPointsQuery(slug).queryKey });
    const file = photo.current;
    if (!file) return;
    photo.current = null;
    setProgress(0);
    // The report counts even if the photo fails; say so instead of failing it.
    import("@/lib/uploads/react")
      .then(({ uploadFiles, uploadRefusal }) =>
        uploadFiles("fillReportPhoto", { files: [file], input: { fillReportId: reportId }, onUploadProgress: (p) => setProgress(p.progress) }).then((results) => {
          const refused = uploadRefusal(results);
          setPhotoNote(refused ? `The report is in. ${refused}` : "Your photo is attached.");
        }),
      )
      .catch((e: Error) => setPhotoNote(`The report is in, but the photo was not saved: ${e.message}`))
      .finally(() => setProgress(null));
  }, [reportId, slug, queryClient]);

  if (reportId) {
    return (
      <div role="status" className="flex flex-col gap-2">
        <p className="font-semibold text-moss-deep">Thanks — the organisers can see your report.</p>
        {photoNote ? <p>{photoNote}</p> : null}
        {progress !== null ? (
          <div role="progressbar" aria-label="Photo upload progress" aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(progress)} className="h-3 overflow-hidden rounded-full bg-white">
            <div className="h-full bg-ember" style={{ width: `${progress}%` }} />
          </div>
        ) : null}
        {live ? <Button variant="secondary" onClick={onDone}>Close</Button> : null}
      </div>
    );
  }

  return (
    <form
      action={send}
      noValidate
      aria-label={`How full is the bin at ${point.name}?`}
      onSubmit={(e) => {
        // With JavaScript the level is checked here first; without, the server says the same.
        if (!new FormData(e.currentTarget).get("level")) {
          e.preventDefault();
          setError("Choose how full the bin is.");
        } else setError(null);
      }}
      className="flex flex-col gap-2 rounded-lg bg-paper-deep p-3"
    >
      <input type="hidden" name="slug" value={slug} />
      <input type="hidden" name="pointId" value={point.id} />
      <RadioGroup id={`level-${point.id}`} name="level" label={`How full is the bin at ${point.name}?`} options={LEVELS} defaultValue={typed(state, "level")} error={state.fields.level} />
      <TextareaField id={`note-${point.id}`} name="note" label="Anything else? (optional)" maxLength={500} rows={2} defaultValue={typed(state, "note")} error={state.fields.note} />
      {live ? (
        <div className="flex flex-col gap-1">
          <label htmlFor={`photo-${point.id}`} className="font-semibold">Photo of the bin (optional)</label>
          <p id={`photo-hint-${point.id}`} className="text-sm text-ink-faint">A JPEG, PNG or WebP photo, at most 4 MB.</p>
          <input
            id={`photo-${point.id}`}
            type="file"
            accept={PHOTO_ACCEPT}
            aria-describedby={`photo-hint-${point.id}`}
            className="min-h-11"
            onChange={(e) => {
              const file = e.target.files?.[0] ?? null;
              const problem = file ? photoProblem(file) : null;
              setError(problem);
              if (problem) e.target.value = "";
              photo.current = problem ? null : file;
            }}
          />
        </div>
      ) : null}
      <FormError message={error ?? (state.ok === false && !state.fields.level ? state.message : null)} />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" disabled={pending}>{pending ? "Sending…" : "Send report"}</Button>
        {live ? <Button type="button" variant="secondary" onClick={onDone}>Cancel</Button> : null}
      </div>
    </form>
  );
}
