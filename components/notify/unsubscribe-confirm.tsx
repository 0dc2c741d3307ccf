"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { IDLE, type ActionState } from "@/lib/api/action-state";
import type { NotificationKind } from "@/lib/notify/kinds";
import { unsubscribeAction } from "@/lib/notify/form-actions";

/** The confirm button behind an unsubscribe link: opening the link changes nothing, pressing this does. */
export function UnsubscribeConfirm({ token, label }: { token: string; label: string }) {
  const [state, send, pending] = useActionState<ActionState<{ kind: NotificationKind; label: string }>, FormData>(unsubscribeAction, IDLE);
  if (state.ok) {
    return (
      <Notice tone="good" title="Done: no more of these e-mails">
        &ldquo;{state.data?.label ?? label}&rdquo; is now off. You can switch it back on under My settings after signing in.
      </Notice>
    );
  }
  return (
    <form action={send} className="flex flex-col gap-3">
      <FormError message={state.ok === false ? state.message : null} />
      <input type="hidden" name="token" value={token} />
      <div>
        <Button type="submit" disabled={pending}>{pending ? "Switching off…" : `Stop \u201c${label}\u201d`}</Button>
      </div>
    </form>
  );
}
