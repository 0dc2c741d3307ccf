"use client";

import { queryOptions, useMutation, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/lib/api/client";
import type { Role } from "@/lib/auth/roles";

export interface Member {
  userId: string;
  name: string;
  email: string;
  role: Role;
  joinedAt: string;
}

export interface Invitation {
  id: string;
  email: string;
  role: Role;
  sentAt: string;
  expiresAt: string;
  expired: boolean;
}

export interface MyGroup {
  id: string;
  slug: string;
  name: string;
  role: Role;
  active: boolean;
}

export const membersQuery = () =>
  queryOptions({ queryKey: ["members"], queryFn: ({ signal }) => fetchJson<Member[]>("/api/members", { signal }) });

export const invitationsQuery = () =>
  queryOptions({ queryKey: ["invitations"], queryFn: ({ signal }) => fetchJson<Invitation[]>("/api/invitations", { signal }) });

export const myGroupsQuery = () =>
  queryOptions({ queryKey: ["me", "groups"], queryFn: ({ signal }) => fetchJson<MyGroup[]>("/api/me/groups", { signal }) });

export function useResendInvitation() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => fetchJson<Invitation>(`/api/invitations/${id}/resend`, { method: "POST" }),
    onSuccess: () => client.invalidateQueries({ queryKey: invitationsQuery().queryKey }),
  });
}

export function useRevokeInvitation() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => fetchJson<{ revoked: true }>(`/api/invitations/${id}`, { method: "DELETE" }),
    onSuccess: () => client.invalidateQueries({ queryKey: invitationsQuery().queryKey }),
  });
}

export function useChangeRole() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: Role }) =>
      fetchJson<Member>(`/api/members/${userId}`, { method: "PATCH", body: { role } }),
    onSuccess: () => client.invalidateQueries({ queryKey: membersQuery().queryKey }),
  });
}

export function useRemoveMember() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) => fetchJson<{ removed: true }>(`/api/members/${userId}`, { method: "DELETE" }),
    onSuccess: () => client.invalidateQueries({ queryKey: membersQuery().queryKey }),
  });
}
