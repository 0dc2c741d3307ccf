import "server-only";
import type { Knex } from "knex";
import { db } from "@/lib/db";
import type { Actor } from "@/lib/auth/queries";
import * as w from "./write";
import * as c from "./write-claims";
import { reverseMovement as reverse } from "./reverse";
import * as sc from "./stock-count";
import type { StockCountInput } from "./stock-count-schema";
import type { HaulInput, ProcessingInput, RecyclingInput, SortInput } from "./schemas";

// The server's entry points for writing the ledger. Each runs in its own
// transaction, or in the caller's (`conn`), e.g. the Idempotency-Key helper's.
// Overdraws throw AppError("conflict", "… only N left …"), i.e. 409.

type Conn = Knex | Knex.Transaction;

export const recordHaul = (actor: Actor, driveId: string, input: HaulInput, conn: Conn = db) => w.recordHaul(actor, driveId, input, conn);
export const recordHaulAtStop = (actor: Actor, driveId: string, input: HaulInput, at: w.HaulStop, conn: Conn = db) =>
  w.recordHaulAtStop(actor, driveId, input, at, conn);
export const recordSort = (actor: Actor, driveId: string, input: SortInput, conn: Conn = db) => w.recordSort(actor, driveId, input, conn);
export const recordProcessing = (actor: Actor, driveId: string, input: ProcessingInput, conn: Conn = db) =>
  w.recordProcessing(actor, driveId, input, conn);
export const prepareProcessing = (actor: Actor, driveId: string, input: ProcessingInput) => w.prepareProcessing(actor, driveId, input, db);
export { ledgerRefusal } from "./post";
export const recordRecycling = (actor: Actor, driveId: string, input: RecyclingInput, conn: Conn = db) =>
  w.recordRecycling(actor, driveId, input, conn);
export const recordClaim = (actor: Actor, heaterUnitId: string, quantity: number, conn: Conn = db, note?: string) =>
  c.recordClaim(actor, heaterUnitId, quantity, conn, note);
export const releaseClaim = (actor: Actor, heaterUnitId: string, quantity: number, conn: Conn = db, note?: string) =>
  c.releaseClaim(actor, heaterUnitId, quantity, conn, note);
export const transferClaim = (actor: Actor, fromId: string, toId: string, quantity: number, conn: Conn, notes: { from: string; to: string }) =>
  c.transferClaim(actor, fromId, toId, quantity, conn, notes);
export const recordBuiltIn = (actor: Actor, heaterUnitId: string, quantity: number, conn: Conn = db, note?: string) =>
  c.recordBuiltIn(actor, heaterUnitId, quantity, conn, note);
export const reverseMovement = (actor: Actor, movementId: string, conn: Conn = db, reason?: string) => reverse(actor, movementId, conn, reason);
export const recordStockCount = (actor: Actor, driveId: string, input: StockCountInput, conn: Conn = db) => sc.recordStockCount(actor, driveId, input, conn);
