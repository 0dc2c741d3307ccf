"use client";

import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import { FormError } from "@/components/ui/field";
import { PHOTO_ACCEPT, photoProblem, uploadRefusal, useUploadThing } from "@/lib/uploads/react";

export function PhotoUploader({ dropPointId }: { dropPointId: string }) {
  const router = useRouter();
  const input = useRef<HTMLInputElement>(null);
  const [progress, setProgress] = useState<number | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState(false);
  const { startUpload, isUploading } = useUploadThing("dropPointPhoto", {
    uploadProgressGranularity: "fine",
    onUploadProgress: setProgress,
    onClientUploadComplete: (results) => {
      setProgress(null);
      if (input.current) input.current.value = "";
      const refused = uploadRefusal(results);
      if (refused) return setError(refused);
      setDone(true);
      router.refresh();
    },
    onUploadError: (e) => {
      setProgress(null);
      setError(`The photo was not saved: ${e.message}`);
    },
  });

  async function onPick(e: React.ChangeEvent<HTMLInputElement>) {
    const file = e.target.files?.[0];
    setDone(false);
    setError(null);
    if (!file) return;
    const problem = photoProblem(file);
    if (problem) {
      setError(problem);
      e.target.value = "";
      return;
    }
    setProgress(0);
    await startUpload([file], { dropPointId }).catch((err: Error) => {
      setProgress(null);
      setError(`The photo was not saved: ${err.message}`);
    });
  }

  return (
    <div className="flex flex-col gap-2">
      <label htmlFor="dp-photo" className="font-semibold">Add a photo of the bin</label>
      <p id="dp-photo-hint" className="text-sm text-ink-faint">A picture (JPEG, PNG or WebP), at most 4 MB. It is shown on the public page.</p>
      <input ref={input} id="dp-photo" type="file" accept={PHOTO_ACCEPT} aria-describedby="dp-photo-hint" onChange={onPick} disabled={isUploading} className="min-h-11" />
      {progress !== null ? (
        <div>
          <div role="progressbar" aria-label="Upload progress" aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(progress)} className="h-3 overflow-hidden rounded-full bg-paper-deep">
            <div className="h-full bg-ember transition-all" style={{ width: `${progress}%` }} />
          </div>
          <p className="text-sm">Uploading… {Math.round(progress)}%</p>
        </div>
      ) : null}
      <FormError message={error} />
      {done ? <p role="status" className="font-semibold text-moss-deep">Photo added.</p> : null}
    </div>
  );
}
