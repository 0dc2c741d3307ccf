"use client";

import { signOutTo } from "@/components/auth/session-client";
import { Button } from "@/components/ui/button";
import { signOutClearing } from "@/lib/offline/forget";

export function SignOutButton() {
  return (
    <Button variant="quiet" className="min-h-9 px-2 py-1" onClick={() => void signOutClearing(() => signOutTo("/signin"))}>
      Sign out
    </Button>
  );
}
