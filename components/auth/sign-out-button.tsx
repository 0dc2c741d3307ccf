"use client";

import { signOutTo } from "@/components/auth/session-client";
import { Button } from "@/components/ui/button";

export function SignOutButton() {
  return (
    <Button variant="quiet" className="min-h-9 px-2 py-1" onClick={() => void signOutTo("/signin")}>
      Sign out
    </Button>
  );
}
