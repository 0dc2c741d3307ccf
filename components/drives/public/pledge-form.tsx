"use client";

import { useActionState, useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError, SelectField } from "@/components/ui/field";
import { IDLE, typed, type ActionState } from "@/lib/api/action-state";
import { pledgeAction, type PledgeAnswer } from "@/lib/drives/form-actions";

export type PledgeChoice = { id: string; name: string };

// A plain form posting to a server action: it sends before this page's
// JavaScript has arrived (or with none at all; the page then comes back with
// the answer), and once React runs it sends without leaving the page. The
// server checks it with the pledge schema (zod stays out of this public page).
export function PledgeForm({ slug, points, initialPoint = "" }: { slug: string; points: PledgeChoice[]; initialPoint?: string }) {
  const [round, setRound] = useState(0);
  return <OnePledge key={round} slug={slug} points={points} initialPoint={initialPoint} again={() => setRound((n) => n + 1)} />;
}

function OnePledge({ slug, points, initialPoint, again }: { slug: string; points: PledgeChoice[]; initialPoint: string; again: () => void }) {
  const [state, send, pending] = useActionState<ActionState<PledgeAnswer>, FormData>(pledgeAction, IDLE);
  const errors = state.fields;

  if (state.ok && state.data) {
    return (
      <div role="status" className="flex flex-col gap-2">
        <p className="font-semibold text-moss-deep">Thank you — your pledge is in.</p>
        {state.data.mailed ? <p>We sent a confirmation to {state.data.email}.</p> : null}
        <Button variant="secondary" onClick={again}>
          Pledge more
        </Button>
      </div>
    );
  }

  return (
    <form action={send} noValidate className="flex flex-col gap-2" aria-label="Pledge cans">
      <input type="hidden" name="slug" value={slug} />
      <p className="text-sm text-ink-soft">Tell us roughly what you will bring, so we can empty bins in time. Name and e-mail are optional and never shown publicly.</p>
      {state.ok === false && !Object.keys(errors).length ? <FormError message={state.message} /> : null}
      <SelectField
        id="pledge-point"
        name="dropPointId"
        label="Drop point"
        placeholder="Choose a drop point…"
        options={points.map((p) => ({ value: p.id, label: p.name }))}
        defaultValue={typed(state, "dropPointId", initialPoint)}
        error={errors.dropPointId}
      />
      <div className="grid gap-2 sm:grid-cols-2">
        <Field id="pledge-bags" name="bags" label="About how many bags" type="text" inputMode="numeric" autoComplete="off" defaultValue={typed(state, "bags", "1")} error={errors.bags} />
        <Field id="pledge-when" name="bringOn" label="When you will bring them" type="date" defaultValue={typed(state, "bringOn")} error={errors.bringOn} />
        <Field id="pledge-name" name="name" label="Your name (optional)" autoComplete="name" defaultValue={typed(state, "name")} error={errors.name} />
        <Field id="pledge-email" name="email" label="E-mail for a confirmation (optional)" type="email" autoComplete="email" defaultValue={typed(state, "email")} error={errors.email} />
      </div>
      <Button type="submit" disabled={pending}>{pending ? "Sending…" : "Send my pledge"}</Button>
    </form>
  );
}
