"use client";

import { forgetThisPhone } from "@/lib/offline/forget";
import Link from "next/link";
import { useState } from "react";
import { signOutTo } from "@/components/auth/session-client";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/ui/field";
import { useLeaveGroup } from "@/hooks/queries/members";

/**
 * Leaving the active group, asked twice. The only organiser is told to hand
 * over first (the server refuses with 409 in any case).
 */
export function LeaveGroup({ groupName, onlyOrganiser }: { groupName: string; onlyOrganiser: boolean }) {
  const leave = useLeaveGroup();
  const [asking, setAsking] = useState(false);
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
      {asking ? (
        <div className="flex flex-wrap gap-2">
          <Button
            variant="danger"
            disabled={leave.isPending}
            onClick={() => leave.mutate(undefined, { onSuccess: () => void forgetThisPhone().then(() => signOutTo("/signin")) })}
          >
            {leave.isPending ? "Leaving…" : `Yes, leave ${groupName}`}
          </Button>
          <Button variant="secondary" onClick={() => setAsking(false)}>
            Stay
          </Button>
        </div>
      ) : (
        <div>
          <Button variant="secondary" onClick={() => setAsking(true)}>
            Leave this group
          </Button>
        </div>
      )}
    </div>
  );
}
