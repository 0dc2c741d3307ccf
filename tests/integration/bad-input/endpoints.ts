import { randomUUID } from "node:crypto";
import type { FieldKind } from "./arbitraries";
import type { OwnGroup } from "@/tests/support/own-group";

// Every POST endpoint the bad-input run throws bodies at: who may call it, and
// for the ledger's writers a valid template to corrupt (so no generated body
// can ever be a valid write). Routes added later are found from app/api and
// taken from their authorisation row (see bad-input.test.ts).
export type Caller = "anonymous" | "volunteer" | "builder" | "organiser";

/** Records the setup made for the run: a haul to sort, a run with a pending stop, the volunteer who drives it. */
export interface Extra {
  haulId: string;
  volunteerId: string;
  runId: string;
  stopId: string;
}

export interface Endpoint {
  route: string;
  /** POST unless said: a few writes that set one thing are PUTs. */
  method?: "POST" | "PUT";
  path: (g: OwnGroup, extra: Extra) => string;
  callers: Caller[];
  ledger: boolean;
  template?: (g: OwnGroup, extra: Extra) => Record<string, unknown>;
  fields?: Record<string, FieldKind>;
}

const count = (min: 0 | 1, max: number, required = true): FieldKind => ({ kind: "count", min, max, required });
const amount = (max: number): FieldKind => ({ kind: "amount", max, required: false });
const quantityOnly = { quantity: count(1, 1_000_000) };
const text = (max: number, required = false): FieldKind => ({ kind: "text", max, required });
const day: FieldKind = { kind: "day", required: true };
const moment: FieldKind = { kind: "moment", required: false };
const weight: FieldKind = { kind: "weight", required: false };
const note = text(500);
const haulTemplate = { bags: 2, weightKg: 6.5, note: "two bags" };
const haulFields = { bags: count(0, 500), weightKg: weight, hauledAt: moment, note };

export const ENDPOINTS: Endpoint[] = [
  {
    route: "app/api/drives/[id]/hauls/route.ts",
    path: (g) => `/api/drives/${g.driveId}/hauls`,
    callers: ["volunteer", "organiser"],
    ledger: true,
    template: (g) => ({ dropPointId: g.dropPointId, ...haulTemplate }),
    fields: { dropPointId: { kind: "choice", values: [], required: true }, ...haulFields },
  },
  {
    route: "app/api/drives/[id]/sorts/route.ts",
    path: (g) => `/api/drives/${g.driveId}/sorts`,
    callers: ["volunteer", "organiser"],
    ledger: true,
    template: (_g, x) => ({ haulIds: [x.haulId], good: 10, rejected: { dented: 1 } }),
    fields: { haulIds: { kind: "ids", required: true }, good: count(0, 1_000_000), rejected: { kind: "rejects", required: false }, sortedAt: moment, note },
  },
  {
    route: "app/api/drives/[id]/processing/route.ts",
    path: (g) => `/api/drives/${g.driveId}/processing`,
    callers: ["volunteer", "organiser"],
    ledger: true,
    template: () => ({ from: "good", to: "washed", quantity: 1, lost: { reason: "damagedWashing", quantity: 1 } }),
    fields: {
      from: { kind: "choice", values: ["good", "washed", "opened"], required: true },
      to: { kind: "choice", values: ["washed", "opened", "punched"], required: true },
      // 0 is allowed only with a loss, and the template has one: its corruptions are the other bad values.
      quantity: count(0, 1_000_000),
      lost: { kind: "loss", required: false },
      occurredAt: moment,
      note,
    },
  },
  {
    // Valid as sent (the setup leaves 170 good cans); every generated body breaks a count.
    route: "app/api/drives/[id]/stock-counts/route.ts",
    path: (g) => `/api/drives/${g.driveId}/stock-counts`,
    callers: ["organiser"],
    ledger: true,
    template: () => ({ counted: { good: 160 }, expected: { good: 170 }, reason: "Shelf recount" }),
    fields: { counted: { kind: "rejects", required: true }, expected: { kind: "rejects", required: true } },
  },
  {
    route: "app/api/drives/[id]/recycling/route.ts",
    path: (g) => `/api/drives/${g.driveId}/recycling`,
    callers: ["volunteer", "organiser"],
    ledger: true,
    template: () => ({ quantity: 1, weightKg: 0.02 }),
    fields: { ...quantityOnly, weightKg: amount(5_000), occurredAt: moment, note },
  },
  ...(["claims", "releases", "built-in"] as const).map((kind) => ({
    route: `app/api/heaters/[id]/${kind}/route.ts`,
    path: (g: OwnGroup) => `/api/heaters/${g.heaterId}/${kind}`,
    callers: ["builder", "organiser"] as Caller[],
    ledger: true,
    template: () => ({ quantity: 1 }),
    fields: { ...quantityOnly, note },
  })),
  {
    // The reversal takes no body; it is aimed at movements that do not exist, so only the junk is under test.
    route: "app/api/movements/[id]/reversal/route.ts",
    path: () => `/api/movements/${randomUUID()}/reversal`,
    callers: ["volunteer", "builder", "organiser"],
    ledger: true,
  },
  {
    // A run's stop: the haul is the ledger's, so the same rules (and weights) hold here.
    route: "app/api/runs/[id]/stops/[stopId]/haul/route.ts",
    path: (_g, x) => `/api/runs/${x.runId}/stops/${x.stopId}/haul`,
    callers: ["volunteer", "organiser"],
    ledger: true,
    template: () => ({ ...haulTemplate }),
    fields: haulFields,
  },
  {
    route: "app/api/drives/route.ts",
    path: () => "/api/drives",
    callers: ["organiser"],
    ledger: false,
    template: (g) => ({ name: "Spring drive", slug: `${g.driveSlug}-spring`, startsOn: "2027-03-01", endsOn: "2027-05-31", isPublic: false, description: "For the hall", wanted: "Rinsed cans" }),
    fields: { name: text(120, true), startsOn: day, endsOn: day, description: text(2000), wanted: text(1000) },
  },
  {
    route: "app/api/drives/[id]/drop-points/route.ts",
    path: (g) => `/api/drives/${g.driveId}/drop-points`,
    callers: ["organiser"],
    ledger: false,
    template: () => ({ name: "Corner shop", address: "1 Lantern Street", lat: 52, lng: -1.6, hours: "Daily 8-18", hostName: "Ada", hostPhone: "+00 555 0100", capacityBags: 6 }),
    fields: { name: text(120, true), address: text(240), hours: text(240), hostName: text(120), hostPhone: text(40), capacityBags: count(1, 100) },
  },
  {
    route: "app/api/public/drives/[slug]/pledges/route.ts",
    path: (g) => `/api/public/drives/${g.driveSlug}/pledges`,
    callers: ["anonymous"],
    ledger: false,
    template: (g) => ({ dropPointId: g.dropPointId, name: "Ada", bags: 2, bringOn: "2026-12-10" }),
    fields: { name: text(120), bags: count(1, 50), bringOn: day },
  },
  {
    route: "app/api/public/drives/[slug]/drop-points/[id]/fill-reports/route.ts",
    path: (g) => `/api/public/drives/${g.driveSlug}/drop-points/${g.dropPointId}/fill-reports`,
    callers: ["anonymous"],
    ledger: false,
    template: () => ({ level: 50, note: "half full" }),
    fields: { note },
  },
  {
    route: "app/api/runs/route.ts",
    path: () => "/api/runs",
    callers: ["organiser"],
    ledger: false,
    template: (g, x) => ({ driveId: g.driveId, plannedOn: "2026-12-12", start: { lat: 52, lng: -1.6 }, dropPointIds: [g.dropPointId], assigneeId: x.volunteerId, notes: "van keys at the hall" }),
    fields: { plannedOn: day, notes: text(1000) },
  },
  {
    route: "app/api/runs/[id]/stops/[stopId]/skip/route.ts",
    path: (_g, x) => `/api/runs/${x.runId}/stops/${x.stopId}/skip`,
    callers: ["volunteer", "organiser"],
    ledger: false,
    template: () => ({ reason: "Bin was locked" }),
    fields: { reason: text(300, true) },
  },
  {
    route: "app/api/heaters/route.ts",
    path: () => "/api/heaters",
    callers: ["builder", "organiser"],
    ledger: false,
    template: (g) => ({ name: "Hall heater", driveId: g.driveId, notes: "south wall", plan: { glazingWidth: 900, glazingHeight: 1800, unit: "mm", coverage: "chamber" } }),
    fields: { name: text(120, true), notes: text(2000) },
  },
  {
    // The person's remembered drive: any body but one naming a drive of the group is refused, and changes nothing.
    route: "app/api/me/drive/route.ts",
    method: "PUT",
    path: () => "/api/me/drive",
    callers: ["volunteer", "builder", "organiser"],
    ledger: false,
    template: (g) => ({ driveId: g.driveId }),
    fields: { driveId: { kind: "choice", values: [], required: true } },
  },
];
