"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/ui/field";
import { fetchJson } from "@/lib/api/client";
import { FILL_LEVELS } from "@/lib/drives/schemas";
import { LEVEL_LABEL } from "@/lib/drives/fill";
import { PHOTO_ACCEPT, photoProblem, uploadRefusal, useUploadThing } from "@/lib/uploads/react";
import { publicDropPointsQuery } from "@/lib/drives/query-options";

export function FillReportForm({ slug, point, onDone }: { slug: string; point: { id: string; name: string }; onDone: () => void }) {
  const [level, setLevel] = useState<number | null>(null);
  const [note, setNote] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [photo, setPhoto] = useState<File | null>(null);
  const [progress, setProgress] = useState<number | null>(null);
  const [photoNote, setPhotoNote] = useState<string | null>(null);
  const queryClient = useQueryClient();
  const { startUpload } = useUploadThing("fillReportPhoto", { uploadProgressGranularity: "fine", onUploadProgress: setProgress });
  const mutation = useMutation({
    mutationFn: async (body: { level: number; note: string }) => {
      const report = await fetchJson<{ id: string; alerted: boolean }>(`/api/public/drives/${slug}/drop-points/${point.id}/fill-reports`, { method: "POST", body });
      if (photo) {
        setProgress(0);
        // The report counts even if the photo fails; say so instead of failing it.
        await startUpload([photo], { fillReportId: report.id })
          .then((results) => {
            const refused = uploadRefusal(results);
            setPhotoNote(refused ? `The report is in. ${refused}` : "Your photo is attached.");
          })
          .catch((e: Error) => setPhotoNote(`The report is in, but the photo was not saved: ${e.message}`))
          .finally(() => setProgress(null));
      }
      return report;
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: publicDropPointsQuery(slug).queryKey }),
  });

  if (mutation.isSuccess) {
    return (
      <div role="status" className="flex flex-col gap-2">
        <p className="font-semibold text-moss-deep">Thanks — the organisers can see your report.</p>
        {photoNote ? <p>{photoNote}</p> : null}
        <Button variant="secondary" onClick={onDone}>Close</Button>
      </div>
    );
  }

  return (
    <form
      noValidate
      aria-label={`How full is the bin at ${point.name}?`}
      onSubmit={(e) => {
        e.preventDefault();
        if (level === null) return setError("Choose how full the bin is.");
        setError(null);
        mutation.mutate({ level, note });
      }}
      className="flex flex-col gap-2 rounded-lg bg-paper-deep p-3"
    >
      <fieldset>
        <legend className="font-semibold">How full is the bin at {point.name}?</legend>
        <div className="mt-1 flex flex-col gap-1">
          {FILL_LEVELS.map((l) => (
            <label key={l} className="flex min-h-11 items-center gap-2">
              <input type="radio" name={`level-${point.id}`} value={l} checked={level === l} onChange={() => setLevel(l)} className="h-5 w-5" />
              {LEVEL_LABEL[l]}
            </label>
          ))}
        </div>
      </fieldset>
      <label htmlFor={`note-${point.id}`} className="font-semibold">Anything else? (optional)</label>
      <textarea id={`note-${point.id}`} value={note} onChange={(e) => setNote(e.target.value)} maxLength={500} rows={2} className="rounded-lg border-2 border-ink/40 bg-white px-3 py-2" />
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
          setPhoto(problem ? null : file);
        }}
      />
      {progress !== null ? (
        <div role="progressbar" aria-label="Photo upload progress" aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(progress)} className="h-3 overflow-hidden rounded-full bg-white">
          <div className="h-full bg-ember" style={{ width: `${progress}%` }} />
        </div>
      ) : null}
      <FormError message={error ?? mutation.error?.message} />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" disabled={mutation.isPending}>{mutation.isPending ? "Sending…" : "Send report"}</Button>
        <Button type="button" variant="secondary" onClick={onDone}>Cancel</Button>
      </div>
    </form>
  );
}
