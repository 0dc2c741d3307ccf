// The ledger endpoints' answers, as both sides see them: the server's queries
// declare they return these, and the client's hooks read them. Safe in the
// client (no server imports).
export type { LedgerPage, LedgerRow } from "./ledger-row";
export type { DriveStock } from "./schemas";
import type { StockCountLine } from "./stock-count-schema";
export type { StockCountLine };

/** One haul of a drive (GET /api/drives/:id/hauls; `?open=1`: not sorted yet). */
export interface OpenHaul {
  id: string;
  movementId: string;
  dropPointId: string;
  dropPointName: string;
  bags: number;
  weightKg: number | null;
  estimatedCans: number;
  estimate: { method: string; countedHauls: number };
  hauledAt: string;
  sorted: boolean;
}

/** One of the signed-in person's recent entries (GET /api/ledger?mine=1), with whether it was undone. */
export interface MyEntry {
  movementId: string;
  kind: string;
  occurredAt: string;
  drive: string;
  dropPoint: string | null;
  details: Record<string, unknown>;
  counted: number;
  estimated: number;
  undone: boolean;
}

/** The answer of POST /api/drives/:id/stock-counts: the adjustment's movement and its lines. */
export interface PostedStockCount {
  movementId: string;
  driveId: string;
  reason: string;
  lines: StockCountLine[];
  occurredAt: string;
}
