"use client";

import { useActionState } from "react";
import { buttonClass } from "@/components/ui/button";
import { FormError } from "@/components/ui/field";
import { IDLE, type ActionState } from "@/lib/api/action-state";
import { fillReportAction } from "@/lib/drives/form-actions";
import { LEVEL_LABEL } from "@/lib/drives/fill";

// The bin's own page (opened from the QR code on its sign): one tap says how
// full it is. Each button submits the plain form with its own level, so it
// works before and without JavaScript (the page comes back with the answer).
const CHOICES = [
  [100, "It is full", "primary"],
  [50, "About half full", "secondary"],
  [0, "It is empty", "secondary"],
] as const;

export function BinQuickReport({ slug, pointId, pointName }: { slug: string; pointId: string; pointName: string }) {
  const [state, send, pending] = useActionState<ActionState<{ id: string }>, FormData>(fillReportAction, IDLE);
  if (state.ok && state.data) {
    return (
      <p role="status" className="rounded-lg bg-moss-soft p-3 text-lg font-semibold text-moss-deep">
        Thank you — the organisers can see your report for {pointName}.
      </p>
    );
  }
  return (
    <form action={send} aria-label={`How full is the bin at ${pointName}?`} className="flex flex-col gap-3">
      <input type="hidden" name="slug" value={slug} />
      <input type="hidden" name="pointId" value={pointId} />
      <FormError message={state.ok === false ? state.message : null} />
      {CHOICES.map(([level, text, variant]) => (
        <button
          key={level}
          type="submit"
          name="level"
          value={level}
          disabled={pending}
          aria-label={`${text} (${LEVEL_LABEL[level]})`}
          className={buttonClass(variant, "min-h-14 w-full text-xl")}
        >
          {text}
        </button>
      ))}
    </form>
  );
}
