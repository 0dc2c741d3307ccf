"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { IDLE, type ActionState } from "@/lib/api/action-state";
import { cancelPledgeAction } from "@/lib/drives/pledge-actions";

/** The confirmation: opening the link changes nothing; only this POST cancels. */
export function PledgeCancelForm({ token }: { token: string }) {
  const [state, send, pending] = useActionState<ActionState<{ id: string; status: string }>, FormData>(cancelPledgeAction, IDLE);
  if (state.ok) {
    return (
      <Notice tone="good" title="Your pledge is cancelled">
        Thank you for letting the organisers know.
      </Notice>
    );
  }
  return (
    <form action={send} className="flex flex-col gap-2">
      <input type="hidden" name="token" value={token} />
      <FormError message={state.ok === false ? (state.message ?? undefined) : undefined} />
      <Button type="submit" variant="danger" disabled={pending}>
        {pending ? "Cancelling…" : "Yes, cancel my pledge"}
      </Button>
    </form>
  );
}
