"use client";

import { useEffect, useRef, useState } from "react";
import { FormError } from "@/components/ui/field";
import { PHOTO_ACCEPT, photoProblem, uploadRefusal, uploadFiles } from "@/lib/uploads/react";

// The photo part of a "bin is full" report: fetched only once React runs and
// the report form is opened (it needs the upload client, which the public
// page's first load leaves out). It keeps the chosen file while the report is
// sent, then uploads it against the stored report.
export function FillPhoto({ pointId, reportId }: { pointId: string; reportId?: string }) {
  const photo = useRef<File | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [progress, setProgress] = useState<number | null>(null);
  const [note, setNote] = useState<string | null>(null);

  useEffect(() => {
    const file = photo.current;
    if (!reportId || !file) return;
    photo.current = null;
    setProgress(0);
    // The report counts even if the photo fails; say so instead of failing it.
    uploadFiles("fillReportPhoto", { files: [file], input: { fillReportId: reportId }, onUploadProgress: (p) => setProgress(p.progress) })
      .then((results) => {
        const refused = uploadRefusal(results);
        setNote(refused ? `The report is in. ${refused}` : "Your photo is attached.");
      })
      .catch((e: Error) => setNote(`The report is in, but the photo was not saved: ${e.message}`))
      .finally(() => setProgress(null));
  }, [reportId]);

  if (reportId) {
    return (
      <>
        {note ? <p role="status">{note}</p> : null}
        {progress !== null ? (
          <div role="progressbar" aria-label="Photo upload progress" aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(progress)} className="h-3 overflow-hidden rounded-full bg-white">
            <div className="h-full bg-ember" style={{ width: `${progress}%` }} />
          </div>
        ) : null}
      </>
    );
  }
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={`photo-${pointId}`} className="font-semibold">Photo of the bin (optional)</label>
      <p id={`photo-hint-${pointId}`} className="text-sm text-ink-faint">A JPEG, PNG or WebP photo, at most 4 MB.</p>
      <input
        id={`photo-${pointId}`}
        type="file"
        accept={PHOTO_ACCEPT}
        aria-describedby={`photo-hint-${pointId}`}
        className="min-h-11"
        onChange={(e) => {
          const file = e.target.files?.[0] ?? null;
          const wrong = file ? photoProblem(file) : null;
          setProblem(wrong);
          if (wrong) e.target.value = "";
          photo.current = wrong ? null : file;
        }}
      />
      <FormError message={problem} />
    </div>
  );
}
