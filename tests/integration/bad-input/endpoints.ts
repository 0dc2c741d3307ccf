import { randomUUID } from "node:crypto";
import type { FieldKind } from "./arbitraries";
import type { OwnGroup } from "@/tests/support/own-group";

// Every POST endpoint the bad-input run throws bodies at: who may call it, and
// for the ledger's writers a valid template to corrupt (so no generated body
// can ever be a valid write). Routes added later are found from app/api and
// taken from their authorisation row (see bad-input.test.ts).
export type Caller = "anonymous" | "volunteer" | "builder" | "organiser";

export interface Endpoint {
  route: string;
  path: (g: OwnGroup, extra: { haulId: string }) => string;
  callers: Caller[];
  ledger: boolean;
  template?: (g: OwnGroup, extra: { haulId: string }) => Record<string, unknown>;
  fields?: Record<string, FieldKind>;
}

const count = (min: 0 | 1, max: number, required = true): FieldKind => ({ kind: "count", min, max, required });
const amount = (max: number): FieldKind => ({ kind: "amount", max, required: false });
const quantityOnly = { quantity: count(1, 1_000_000) };

export const ENDPOINTS: Endpoint[] = [
  {
    route: "app/api/drives/[id]/hauls/route.ts",
    path: (g) => `/api/drives/${g.driveId}/hauls`,
    callers: ["volunteer", "organiser"],
    ledger: true,
    template: (g) => ({ dropPointId: g.dropPointId, bags: 2, weightKg: 6.5, note: "two bags" }),
    fields: { dropPointId: { kind: "choice", values: [], required: true }, bags: count(0, 500), weightKg: amount(5_000) },
  },
  {
    route: "app/api/drives/[id]/sorts/route.ts",
    path: (g) => `/api/drives/${g.driveId}/sorts`,
    callers: ["volunteer", "organiser"],
    ledger: true,
    template: (_g, x) => ({ haulIds: [x.haulId], good: 10, rejected: { dented: 1 } }),
    fields: { haulIds: { kind: "ids", required: true }, good: count(0, 1_000_000), rejected: { kind: "rejects", required: false } },
  },
  {
    route: "app/api/drives/[id]/processing/route.ts",
    path: (g) => `/api/drives/${g.driveId}/processing`,
    callers: ["volunteer", "organiser"],
    ledger: true,
    template: () => ({ from: "good", to: "washed", quantity: 1 }),
    fields: {
      from: { kind: "choice", values: ["good", "washed", "opened"], required: true },
      to: { kind: "choice", values: ["washed", "opened", "punched"], required: true },
      quantity: count(1, 1_000_000),
    },
  },
  {
    route: "app/api/drives/[id]/recycling/route.ts",
    path: (g) => `/api/drives/${g.driveId}/recycling`,
    callers: ["volunteer", "organiser"],
    ledger: true,
    template: () => ({ quantity: 1, weightKg: 0.02 }),
    fields: { ...quantityOnly, weightKg: amount(5_000) },
  },
  ...(["claims", "releases", "built-in"] as const).map((kind) => ({
    route: `app/api/heaters/[id]/${kind}/route.ts`,
    path: (g: OwnGroup) => `/api/heaters/${g.heaterId}/${kind}`,
    callers: ["builder", "organiser"] as Caller[],
    ledger: true,
    template: () => ({ quantity: 1 }),
    fields: quantityOnly,
  })),
  {
    // The reversal takes no body; it is aimed at movements that do not exist, so only the junk is under test.
    route: "app/api/movements/[id]/reversal/route.ts",
    path: () => `/api/movements/${randomUUID()}/reversal`,
    callers: ["volunteer", "builder", "organiser"],
    ledger: true,
  },
  { route: "app/api/drives/route.ts", path: () => "/api/drives", callers: ["organiser"], ledger: false },
  { route: "app/api/drives/[id]/drop-points/route.ts", path: (g) => `/api/drives/${g.driveId}/drop-points`, callers: ["organiser"], ledger: false },
  { route: "app/api/public/drives/[slug]/pledges/route.ts", path: (g) => `/api/public/drives/${g.driveSlug}/pledges`, callers: ["anonymous"], ledger: false },
  {
    route: "app/api/public/drives/[slug]/drop-points/[id]/fill-reports/route.ts",
    path: (g) => `/api/public/drives/${g.driveSlug}/drop-points/${g.dropPointId}/fill-reports`,
    callers: ["anonymous"],
    ledger: false,
  },
];
