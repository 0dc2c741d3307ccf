"use client";

import { createContext, useContext } from "react";

// The signed-in person's user id and active group, for what this phone keeps under their name
// (the offline queue's owner and group). Given by the signed-in layout (OfflineKeeper).
const PersonContext = createContext<{ id: string; group: string } | null>(null);

export const PersonProvider = PersonContext.Provider;

export function usePersonId(): string | null {
  return useContext(PersonContext)?.id ?? null;
}

export function usePersonGroup(): string | null {
  return useContext(PersonContext)?.group ?? null;
}
