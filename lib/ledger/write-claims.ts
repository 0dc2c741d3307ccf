import type { Knex } from "knex";
import { conflict, notFound } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/queries";
import { ledgerCall, ledgerPayload, runLedgerFunction, type LineSpec, type OwnRefusals } from "./post";

// Claims reserve processed cans (good, washed, opened or punched) of a drive
// for one heater unit; the drive's unclaimed cans can never go below zero.
// Building in consumes punched cans and the same number from the unit's claim.
// The unit is read first; ledger_unit (db/functions/ledger_writers.sql) then
// locks the drive and the unit, checks the unit is still on that drive (and
// not installed, for a claim), posts the lines and moves the unit's state.

type Conn = Knex | Knex.Transaction;
type Action = "claim" | "release" | "builtIn";

const REFUSALS: OwnRefusals = {
  unitMoved: () => conflict("The unit moved to another drive meanwhile; try again."),
  unitInstalled: () => conflict("This unit is already installed; it takes no more cans."),
};

interface UnitAnswer {
  movementId: string;
  state: string;
  claimed: number | string;
  builtIn: number | string;
}

/** Reads the unit (no lock) and builds ledger_unit's payload; the function re-checks what could change. */
async function prepareForUnit(actor: Actor, heaterUnitId: string, action: Action, lines: (unitId: string) => LineSpec[], conn: Conn) {
  const unit = await conn("heater_units").select("id", "drive_id", "state").where({ id: heaterUnitId, group_id: actor.group.id }).first();
  if (!unit) throw notFound("That heater unit");
  if (!unit.drive_id) throw conflict("This unit is not counted against a drive yet; add it to a drive before claiming cans.");
  if (action === "claim" && unit.state === "installed") throw REFUSALS.unitInstalled({});
  const payload = ledgerPayload(
    { groupId: actor.group.id, driveId: unit.drive_id, actorId: actor.user.id, kind: action, details: { heaterUnitId: unit.id } },
    lines(unit.id),
    { unit: { id: unit.id, action } },
  );
  return { unit: { id: unit.id as string, driveId: unit.drive_id as string }, payload };
}

function unitAnswer(unit: { id: string; driveId: string }, r: UnitAnswer) {
  return { movementId: r.movementId, heaterUnitId: unit.id, driveId: unit.driveId, state: r.state, claimed: Number(r.claimed), builtIn: Number(r.builtIn) };
}

async function postForUnit(actor: Actor, heaterUnitId: string, action: Action, lines: (unitId: string) => LineSpec[], conn: Conn) {
  const { unit, payload } = await prepareForUnit(actor, heaterUnitId, action, lines, conn);
  return unitAnswer(unit, await runLedgerFunction<UnitAnswer>(conn, ledgerCall("ledger_unit", payload), REFUSALS));
}

/**
 * Moves claimed cans from one unit to another: a release and a claim, two
 * movements posted by one call of ledger_units, so the cans are never free for
 * someone else in between, a refused claim undoes the release, and the drive's
 * lock is not held across a round trip.
 */
export async function transferClaim(actor: Actor, fromId: string, toId: string, quantity: number, conn: Conn, notes: { from: string; to: string }) {
  const release = await prepareForUnit(actor, fromId, "release", (id) => [{ from: "claimed", to: null, quantity, heaterUnitId: id, note: notes.from }], conn);
  const claim = await prepareForUnit(actor, toId, "claim", (id) => [{ from: null, to: "claimed", quantity, heaterUnitId: id, note: notes.to }], conn);
  const [released, claimed] = await runLedgerFunction<[UnitAnswer, UnitAnswer]>(conn, ledgerCall("ledger_units", [release.payload, claim.payload]), REFUSALS);
  return { from: { ...unitAnswer(release.unit, released), quantity }, to: { ...unitAnswer(claim.unit, claimed), quantity } };
}

export async function recordClaim(actor: Actor, heaterUnitId: string, quantity: number, conn: Conn, note?: string) {
  const r = await postForUnit(actor, heaterUnitId, "claim", (id) => [{ from: null, to: "claimed", quantity, heaterUnitId: id, note }], conn);
  return { movementId: r.movementId, heaterUnitId: r.heaterUnitId, driveId: r.driveId, quantity, state: r.state, claimed: r.claimed, builtIn: r.builtIn };
}

export async function releaseClaim(actor: Actor, heaterUnitId: string, quantity: number, conn: Conn, note?: string) {
  const r = await postForUnit(actor, heaterUnitId, "release", (id) => [{ from: "claimed", to: null, quantity, heaterUnitId: id, note }], conn);
  return { movementId: r.movementId, heaterUnitId: r.heaterUnitId, driveId: r.driveId, quantity, state: r.state, claimed: r.claimed, builtIn: r.builtIn };
}

export async function recordBuiltIn(actor: Actor, heaterUnitId: string, quantity: number, conn: Conn, note?: string) {
  const r = await postForUnit(
    actor,
    heaterUnitId,
    "builtIn",
    (id) => [
      { from: "claimed", to: null, quantity, heaterUnitId: id, note },
      { from: "punched", to: "builtIn", quantity, heaterUnitId: id, note },
    ],
    conn,
  );
  return { movementId: r.movementId, heaterUnitId: r.heaterUnitId, driveId: r.driveId, quantity, state: r.state, claimed: r.claimed, builtIn: r.builtIn };
}
