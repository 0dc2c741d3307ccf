"use client";

import { AppHeader } from "@/components/layout/app-header";
import type { Role } from "@/lib/auth/roles";

/** A signed-in person's frame on a page anyone may open: the group's navigation and the session. */
export function SignedInShell({ groupName, role, userName, children }: { groupName: string; role: Role; userName: string; children: React.ReactNode }) {
  return (
    <>
      <AppHeader groupName={groupName} role={role} userName={userName} />
      {children}
    </>
  );
}
