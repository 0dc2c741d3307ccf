import type { Knex } from "knex";
import { conflict, notFound } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/queries";
import { inTx, lockDrive, postMovement, type Trx } from "./post";

// Claims reserve processed cans (good, washed, opened or punched) of a drive
// for one heater unit; the drive's unclaimed cans can never go below zero.
// Building in consumes punched cans and the same number from the unit's claim.

type Conn = Knex | Knex.Transaction;

async function lockedUnit(trx: Trx, actor: Actor, heaterUnitId: string) {
  const unit = await trx("heater_units").select("id", "drive_id", "name").where({ id: heaterUnitId, group_id: actor.group.id }).first();
  if (!unit) throw notFound("That heater unit");
  if (!unit.drive_id) throw conflict("This unit is not counted against a drive yet; add it to a drive before claiming cans.");
  // Drive first, then the unit: every writer takes locks in this order.
  await lockDrive(trx, actor.group.id, unit.drive_id);
  const locked = await trx("heater_units").select("id", "drive_id", "name", "state").where({ id: unit.id }).forNoKeyUpdate().first();
  if (!locked || locked.drive_id !== unit.drive_id) throw conflict("The unit moved to another drive meanwhile; try again.");
  return locked as { id: string; drive_id: string; name: string; state: string };
}

export async function recordClaim(actor: Actor, heaterUnitId: string, quantity: number, conn: Conn, note?: string) {
  return inTx(conn, async (trx) => {
    const unit = await lockedUnit(trx, actor, heaterUnitId);
    if (unit.state === "installed") throw conflict("This unit is already installed; it takes no more cans.");
    const { movementId } = await postMovement(
      trx,
      { groupId: actor.group.id, driveId: unit.drive_id, actorId: actor.user.id, kind: "claim", details: { heaterUnitId: unit.id } },
      [{ from: null, to: "claimed", quantity, heaterUnitId: unit.id, note }],
    );
    const state = unit.state === "planned" ? "claiming" : unit.state;
    if (state !== unit.state) await trx("heater_units").where({ id: unit.id }).update({ state });
    return { movementId, heaterUnitId: unit.id, driveId: unit.drive_id, quantity, state, ...(await unitTotals(trx, unit.id)) };
  });
}

export async function releaseClaim(actor: Actor, heaterUnitId: string, quantity: number, conn: Conn, note?: string) {
  return inTx(conn, async (trx) => {
    const unit = await lockedUnit(trx, actor, heaterUnitId);
    const { movementId } = await postMovement(
      trx,
      { groupId: actor.group.id, driveId: unit.drive_id, actorId: actor.user.id, kind: "release", details: { heaterUnitId: unit.id } },
      [{ from: "claimed", to: null, quantity, heaterUnitId: unit.id, note }],
    );
    return { movementId, heaterUnitId: unit.id, driveId: unit.drive_id, quantity, state: unit.state, ...(await unitTotals(trx, unit.id)) };
  });
}

export async function recordBuiltIn(actor: Actor, heaterUnitId: string, quantity: number, conn: Conn, note?: string) {
  return inTx(conn, async (trx) => {
    const unit = await lockedUnit(trx, actor, heaterUnitId);
    const { movementId } = await postMovement(
      trx,
      { groupId: actor.group.id, driveId: unit.drive_id, actorId: actor.user.id, kind: "builtIn", details: { heaterUnitId: unit.id } },
      [
        { from: "claimed", to: null, quantity, heaterUnitId: unit.id, note },
        { from: "punched", to: "builtIn", quantity, heaterUnitId: unit.id, note },
      ],
    );
    const state = unit.state === "planned" || unit.state === "claiming" ? "building" : unit.state;
    if (state !== unit.state) await trx("heater_units").where({ id: unit.id }).update({ state });
    return { movementId, heaterUnitId: unit.id, driveId: unit.drive_id, quantity, state, ...(await unitTotals(trx, unit.id)) };
  });
}

async function unitTotals(trx: Trx, heaterUnitId: string): Promise<{ claimed: number; builtIn: number }> {
  const rows = await trx("stage_balances").select("stage", "quantity").where({ heater_unit_id: heaterUnitId });
  const of = (stage: string) => Number(rows.find((r) => r.stage === stage)?.quantity ?? 0);
  return { claimed: of("claimed"), builtIn: of("builtIn") };
}
