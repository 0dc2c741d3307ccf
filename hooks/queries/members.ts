"use client";

import { queryOptions, useMutation, useQueryClient } from "@tanstack/react-query";
import { memberKeys } from "./keys";
import { useCallback } from "react";
import { fetchJson } from "@/lib/api/client";
import type { Role } from "@/lib/auth/roles";
import type { Invitation, Member, MyGroup } from "@/lib/accounts/types";

export type { Invitation, Member, MyGroup };

export { memberKeys };

// The accounts domain's keys, reads and writes. Every key starts with
// "members"; each mutation refreshes the keys it changes.

export const memberQueries = {
  list: () => queryOptions({ queryKey: memberKeys.list(), queryFn: ({ signal }) => fetchJson<Member[]>("/api/members", { signal }) }),
  invitations: () =>
    queryOptions({ queryKey: memberKeys.invitations(), queryFn: ({ signal }) => fetchJson<Invitation[]>("/api/invitations", { signal }) }),
  myGroups: () => queryOptions({ queryKey: memberKeys.myGroups(), queryFn: ({ signal }) => fetchJson<MyGroup[]>("/api/me/groups", { signal }) }),
};

export function useResendInvitation() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => fetchJson<Invitation>(`/api/invitations/${id}/resend`, { method: "POST" }),
    onSuccess: () => client.invalidateQueries({ queryKey: memberKeys.invitations() }),
  });
}

export function useRevokeInvitation() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => fetchJson<{ revoked: true }>(`/api/invitations/${id}`, { method: "DELETE" }),
    onSuccess: () => client.invalidateQueries({ queryKey: memberKeys.invitations() }),
  });
}

/** The invite form is a server action; after one is sent, the pending list (a react-query read) is refreshed. */
export function useInvitationSent() {
  const client = useQueryClient();
  return useCallback(() => client.invalidateQueries({ queryKey: memberKeys.invitations() }), [client]);
}

export function useChangeRole() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: Role }) =>
      fetchJson<Member>(`/api/members/${userId}`, { method: "PATCH", body: { role } }),
    onSuccess: () => client.invalidateQueries({ queryKey: memberKeys.list() }),
  });
}

export function useRemoveMember() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) => fetchJson<{ removed: true }>(`/api/members/${userId}`, { method: "DELETE" }),
    onSuccess: () => client.invalidateQueries({ queryKey: memberKeys.list() }),
  });
}

/** After the session moves to another group every cached read belongs to the old one: all are refreshed. */
export function useGroupSwitched() {
  const client = useQueryClient();
  return useCallback(() => client.invalidateQueries(), [client]);
}

/** Leaving the active group ends the person's sessions: the caller signs out after. */
export function useLeaveGroup() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => fetchJson<{ left: true; groupsLeft: number }>("/api/me/leave", { method: "POST", body: { confirm: true } }),
    onSuccess: () => client.invalidateQueries({ queryKey: memberKeys.all }),
  });
}

export function useHandOver() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, then }: { userId: string; then: "volunteer" | "builder" | "leave" }) =>
      fetchJson<{ organiser: string; then: string }>(`/api/members/${userId}/hand-over`, { method: "POST", body: { then } }),
    onSuccess: () => client.invalidateQueries({ queryKey: memberKeys.all }),
  });
}
