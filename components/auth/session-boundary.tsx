"use client";

import { SessionProvider } from "next-auth/react";

// Only the parts that read or update the session need next-auth's provider;
// keeping it out of the root layout keeps public pages lighter.
export function SessionBoundary({ children }: { children: React.ReactNode }) {
  return <SessionProvider refetchOnWindowFocus={false}>{children}</SessionProvider>;
}
