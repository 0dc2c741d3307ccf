"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { IDLE, type ActionState } from "@/lib/api/action-state";
import { NOTIFICATION_KINDS, NOTIFICATION_TEXT, type NotificationSettings } from "@/lib/notify/kinds";
import { saveNotificationsAction } from "@/lib/notify/form-actions";

/** One checkbox per kind of e-mail; a plain form to a server action, so it works without JavaScript. */
export function NotificationForm({ settings }: { settings: NotificationSettings }) {
  const [state, send, pending] = useActionState<ActionState<NotificationSettings>, FormData>(saveNotificationsAction, IDLE);
  const shown = state.ok && state.data ? state.data : settings;
  return (
    <form action={send} className="flex flex-col gap-3" aria-label="E-mail notifications">
      <FormError message={state.ok === false ? state.message : null} />
      {state.ok ? <Notice tone="good" title="Saved">Your e-mail settings are stored.</Notice> : null}
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 font-semibold">Send me</legend>
        {NOTIFICATION_KINDS.map((kind) => (
          <label key={`${kind}-${String(shown[kind])}`} className="flex min-h-11 items-start gap-3 rounded-lg px-1 py-2">
            <input type="checkbox" name={kind} defaultChecked={shown[kind]} className="mt-1 h-5 w-5 shrink-0 accent-ember" aria-describedby={`${kind}-hint`} />
            <span>
              <span className="block font-semibold">{NOTIFICATION_TEXT[kind].label}</span>
              <span id={`${kind}-hint`} className="block text-sm text-ink-soft">
                {NOTIFICATION_TEXT[kind].hint}
              </span>
            </span>
          </label>
        ))}
      </fieldset>
      <div>
        <Button type="submit" disabled={pending}>{pending ? "Saving…" : "Save e-mail settings"}</Button>
      </div>
    </form>
  );
}
