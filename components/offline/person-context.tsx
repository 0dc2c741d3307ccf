"use client";

import { createContext, useContext } from "react";

// The signed-in person's user id, for what this phone keeps under their name
// (the offline queue's owner). Given by the signed-in layout (OfflineKeeper).
const PersonContext = createContext<string | null>(null);

export const PersonProvider = PersonContext.Provider;

export function usePersonId(): string | null {
  return useContext(PersonContext);
}
