"use client";

import { useQuery } from "@tanstack/react-query";
import { Button } from "@/components/ui/button";
import { EmptyState, Skeleton } from "@/components/ui/card";
import { FormError } from "@/components/ui/field";
import { LoadError } from "@/components/ui/load-error";
import { ROLE_LABEL } from "@/lib/auth/roles";
import { memberQueries, useResendInvitation, useRevokeInvitation } from "@/hooks/queries/members";
import { useFormat } from "@/hooks/use-look";


export function InvitationList() {
  // The group's style (lib/format), not the browser's own locale.
  const day = useFormat().dayOf;
  const { data, isPending, error, refetch } = useQuery(memberQueries.invitations());
  const resend = useResendInvitation();
  const revoke = useRevokeInvitation();

  if (isPending) return <ListSkeleton />;
  if (error) return <LoadError message={error.message} onRetry={() => void refetch()} />;
  if (data.length === 0) return <EmptyState title="No open invitations">People you invite appear here until they accept.</EmptyState>;
  const actionError = resend.error?.message ?? revoke.error?.message ?? null;
  return (
    <div className="flex flex-col gap-2">
      <FormError message={actionError} />
      <ul className="divide-y divide-paper-edge" aria-label="Open invitations">
        {data.map((inv) => (
          <li key={inv.id} className="flex flex-wrap items-center justify-between gap-2 py-3">
            <span className="min-w-0">
              <span className="block break-all font-semibold">{inv.email}</span>
              <span className="text-sm text-ink-faint">
                {ROLE_LABEL[inv.role]} · sent {day(inv.sentAt)} ·{" "}
                {inv.expired ? <strong className="text-alarm">expired</strong> : `expires ${day(inv.expiresAt)}`}
              </span>
            </span>
            <span className="flex gap-2">
              <Button variant="secondary" disabled={resend.isPending} onClick={() => resend.mutate(inv.id)} aria-label={`Resend invitation to ${inv.email}`}>
                Resend
              </Button>
              <Button variant="quiet" disabled={revoke.isPending} onClick={() => revoke.mutate(inv.id)} aria-label={`Withdraw invitation to ${inv.email}`}>
                Withdraw
              </Button>
            </span>
          </li>
        ))}
      </ul>
    </div>
  );
}

export function ListSkeleton() {
  return (
    <div className="flex flex-col gap-3" aria-busy="true" aria-label="Loading">
      <Skeleton className="h-6 w-2/3" />
      <Skeleton className="h-6 w-1/2" />
      <Skeleton className="h-6 w-3/5" />
    </div>
  );
}
