"use client";

import { forgetThisPhone, unsentCount } from "@/lib/offline/forget";
import Link from "next/link";
import { useState } from "react";
import { signOutTo } from "@/components/auth/session-client";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { countOf, noun } from "@/lib/plural";
import { useLeaveGroup } from "@/hooks/queries/members";
import { usePersonGroup } from "@/components/offline/person-context";

/**
 * Leaving the active group, asked twice. The only organiser is told to hand
 * over first (the server refuses with 409 in any case).
 */
export function LeaveGroup({ groupName, onlyOrganiser }: { groupName: string; onlyOrganiser: boolean }) {
  const leave = useLeaveGroup();
  const [asking, setAsking] = useState(false);
  /** Entries on this phone not yet on the server: leaving deletes them with everything else kept here. */
  const group = usePersonGroup();
  const [{ all: unsent, here }, setUnsent] = useState({ all: 0, here: 0 });
  if (onlyOrganiser) {
    return (
      <p className="text-ink-soft">
        You are the only organiser of {groupName}. To leave, first <Link href="/members#hand-over">hand the group over</Link> to another member.
      </p>
    );
  }
  return (
    <div className="flex flex-col gap-3">
      <p className="text-ink-soft">
        You stop being a member of {groupName} and are signed out. What you logged stays in the group&rsquo;s ledger under your name;
        runs given to you that are not done go back to the organisers.
      </p>
      <FormError message={leave.error?.message ?? null} />
      {asking && unsent > 0 ? (
        <Notice tone="caution" title={`${countOf(unsent, noun("entry has", "entries have"))} not been sent yet`}>
          <p data-testid="leave-unsent">
            Leaving deletes {unsent === 1 ? "it" : "them"} from this phone with everything else kept here for you. Go to Log while you have a signal and let{" "}
            {unsent === 1 ? "it" : "them"} send first (or drop what was refused), unless you mean to lose {unsent === 1 ? "it" : "them"}.
          </p>
          {unsent > here ? (
            <p className="mt-1">
              {countOf(unsent - here, noun("of them is", "of them are"))} for another of your groups: switch to it and open Log there to send{" "}
              {unsent - here === 1 ? "it" : "them"}.
            </p>
          ) : null}
          <p className="mt-1">
            <Link href="/log" className="tap">See what is waiting</Link>
          </p>
        </Notice>
      ) : null}
      {asking ? (
        <div className="flex flex-wrap gap-2">
          <Button
            variant="danger"
            disabled={leave.isPending}
            onClick={() => leave.mutate(undefined, { onSuccess: () => void forgetThisPhone().then(() => signOutTo("/signin")) })}
          >
            {leave.isPending ? "Leaving…" : unsent > 0 ? `Yes, leave ${groupName} and delete ${unsent === 1 ? "it" : "them"}` : `Yes, leave ${groupName}`}
          </Button>
          <Button variant="secondary" onClick={() => setAsking(false)}>
            Stay
          </Button>
        </div>
      ) : (
        <div>
          <Button
            variant="secondary"
            onClick={() => {
              // Asked before the second question, so the warning is there before "Yes, leave".
              void unsentCount(group).then((n) => {
                setUnsent(n);
                setAsking(true);
              });
            }}
          >
            Leave this group
          </Button>
        </div>
      )}
    </div>
  );
}
