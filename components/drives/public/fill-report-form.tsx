"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/ui/field";
import { apiFetch } from "@/lib/api/client";
import { FILL_LEVELS } from "@/lib/drives/schemas";
import { LEVEL_LABEL } from "@/lib/drives/fill";

export function FillReportForm({ slug, point, onDone }: { slug: string; point: { id: string; name: string }; onDone: () => void }) {
  const [level, setLevel] = useState<number | null>(null);
  const [note, setNote] = useState("");
  const [error, setError] = useState<string | null>(null);
  const queryClient = useQueryClient();
  const mutation = useMutation({
    mutationFn: (body: { level: number; note: string }) =>
      apiFetch<{ id: string; alerted: boolean }>(`/api/public/drives/${slug}/drop-points/${point.id}/fill-reports`, { method: "POST", body }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ["public-drive", slug, "drop-points"] }),
  });

  if (mutation.isSuccess) {
    return (
      <div role="status" className="flex flex-col gap-2">
        <p className="font-semibold text-moss-deep">Thanks — the organisers can see your report.</p>
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
      <FormError message={error ?? mutation.error?.message} />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" disabled={mutation.isPending}>{mutation.isPending ? "Sending…" : "Send report"}</Button>
        <Button type="button" variant="secondary" onClick={onDone}>Cancel</Button>
      </div>
    </form>
  );
}
