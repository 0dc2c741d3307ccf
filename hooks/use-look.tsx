"use client";

import { createContext, useContext, useMemo } from "react";
import { DEFAULT_LOOK, formatter, type Formatter, type Look } from "@/lib/format";

// The group's look (lib/format) for client components, given once by the
// signed-in layout (and the public drive page, for the drive's group) so a
// client component formats like the server without a prop through every level.
const LookContext = createContext<Look>(DEFAULT_LOOK);

export function LookProvider({ look, children }: { look: Look; children: React.ReactNode }) {
  return <LookContext.Provider value={look}>{children}</LookContext.Provider>;
}

/** The formatters bound to the group's look: `const f = useFormat(); f.moment(at)`. */
export function useFormat(): Formatter {
  const look = useContext(LookContext);
  return useMemo(() => formatter(look), [look]);
}
