// Every domain's query keys, in a module without "use client" so a server page
// can put what it read under the same keys (components/query/prefetched.tsx).
// Each key starts with its domain's name; the domain's hooks file re-exports its factory.
import type { RouteInputRaw } from "@/lib/runs/route-schemas";

// The drive keys have their own file: the public drive page loads them and nothing else here.
export { driveKeys } from "./drive-keys";


export const heaterKeys = {
  all: ["heaters"] as const,
  list: () => [...heaterKeys.all, "list"] as const,
  detail: (id: string) => [...heaterKeys.all, "detail", id] as const,
};

export const ledgerKeys = {
  all: ["ledger"] as const,
  list: (filters: Record<string, string>) => [...ledgerKeys.all, "list", filters] as const,
  detail: (movementId: string) => [...ledgerKeys.all, "movement", movementId] as const,
  stock: (driveId: string) => [...ledgerKeys.all, "stock", driveId] as const,
  openHauls: (driveId: string) => [...ledgerKeys.all, "hauls", driveId, "open"] as const,
  mine: () => [...ledgerKeys.all, "mine"] as const,
};

export const memberKeys = {
  all: ["members"] as const,
  list: () => [...memberKeys.all, "list"] as const,
  detail: (userId: string) => [...memberKeys.all, "detail", userId] as const,
  invitations: () => [...memberKeys.all, "invitations"] as const,
  myGroups: () => [...memberKeys.all, "me", "groups"] as const,
};

export const runKeys = {
  all: ["runs"] as const,
  list: () => [...runKeys.all, "list"] as const,
  detail: (id: string) => [...runKeys.all, "detail", id] as const,
  suggestions: (driveId: string) => [...runKeys.all, "suggestions", driveId] as const,
  route: (input: RouteInputRaw) => [...runKeys.all, "route", input] as const,
};
