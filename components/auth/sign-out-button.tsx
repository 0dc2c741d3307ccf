"use client";

import { signOut } from "next-auth/react";
import { Button } from "@/components/ui/button";

export function SignOutButton() {
  return (
    <Button variant="quiet" className="min-h-9 px-2 py-1" onClick={() => signOut({ callbackUrl: "/signin" })}>
      Sign out
    </Button>
  );
}
