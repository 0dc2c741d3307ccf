"use client";

import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { FormError, SelectBox } from "@/components/ui/field";
import { LoadError } from "@/components/ui/load-error";
import type { Role } from "@/lib/auth/roles";
import { memberQueries, useChangeRole, useRemoveMember, type Member } from "@/hooks/queries/members";
import { ListSkeleton } from "./invitation-list";
import { ROLE_CHOICES } from "./role-select";

export function MemberList({ currentUserId }: { currentUserId: string }) {
  const { data, isPending, error, refetch } = useQuery(memberQueries.list());
  const changeRole = useChangeRole();
  const remove = useRemoveMember();
  const [confirming, setConfirming] = useState<string | null>(null);

  if (isPending) return <ListSkeleton />;
  if (error) return <LoadError message={error.message} onRetry={() => void refetch()} />;
  const actionError = changeRole.error?.message ?? remove.error?.message ?? null;
  return (
    <div className="flex flex-col gap-2">
      <FormError message={actionError} />
      <ul className="divide-y divide-paper-edge" aria-label="Members">
        {data.map((m: Member) => (
          <li key={m.userId} id={`member-${m.userId}`} className="flex flex-wrap items-center justify-between gap-2 py-3">
            <span className="min-w-0">
              <span className="block font-semibold">
                {m.name}
                {m.userId === currentUserId ? <span className="font-normal text-ink-faint"> (you)</span> : null}
              </span>
              <span className="block break-all text-sm text-ink-faint">{m.email}</span>
            </span>
            <span className="flex flex-wrap items-center gap-2">
              <label className="sr-only" htmlFor={`role-${m.userId}`}>
                Role of {m.name}
              </label>
              <SelectBox
                id={`role-${m.userId}`}
                value={m.role}
                disabled={changeRole.isPending}
                onChange={(e) => changeRole.mutate({ userId: m.userId, role: e.target.value as Role })}
                options={ROLE_CHOICES}
              />
              {confirming === m.userId ? (
                <>
                  <Button variant="danger" disabled={remove.isPending} onClick={() => remove.mutate(m.userId, { onSettled: () => setConfirming(null) })}>
                    Remove {m.name.split(" ")[0]}
                  </Button>
                  <Button variant="quiet" onClick={() => setConfirming(null)}>
                    Keep
                  </Button>
                </>
              ) : (
                <Button variant="quiet" onClick={() => setConfirming(m.userId)} aria-label={`Remove ${m.name} from the group`}>
                  Remove
                </Button>
              )}
            </span>
          </li>
        ))}
      </ul>
    </div>
  );
}
