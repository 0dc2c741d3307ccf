import "server-only";
import { AppError, notFound } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/queries";
import { db } from "@/lib/db";
import { lockDrive } from "@/lib/ledger/post";
import { releaseClaim } from "@/lib/ledger/record";
import { getHeaterUnit } from "./queries";
import { checkStateMove } from "./states";
import type { HeaterState } from "./unit-schemas";

/**
 * Moves a unit along planned → claiming → building → installed under its row
 * lock, so two people moving it at once cannot skip the rule. Going on the
 * wall gives its unbuilt claims back to the drive in the same transaction (a
 * `release` movement, undoable like any other), so no cans stay locked to a
 * finished heater. Locks are taken drive first, then the unit, the order
 * every ledger writer uses.
 */
export async function moveUnitState(actor: Actor, id: string, to: HeaterState) {
  const groupId = actor.group.id;
  const released = await db.transaction(async (trx) => {
    const unit = await trx("heater_units").select("drive_id").where({ id, group_id: groupId }).first();
    if (!unit) throw notFound("That heater unit");
    if (unit.drive_id) await lockDrive(trx, groupId, unit.drive_id);
    const row = await trx("heater_units").select("state", "drive_id").where({ id, group_id: groupId }).forNoKeyUpdate().first();
    if (!row) throw notFound("That heater unit");
    if (row.drive_id !== unit.drive_id) throw new AppError("conflict", "The unit moved to another drive meanwhile; try again.");
    const verdict = checkStateMove(row.state, to, actor.role);
    if (!verdict.ok) throw new AppError("conflict", verdict.reason, { details: { state: row.state } });
    let releasedCans = 0;
    if (to === "installed" && row.drive_id) {
      const claimed = await trx("stage_balances").where({ heater_unit_id: id, drive_id: row.drive_id, stage: "claimed" }).first("quantity");
      releasedCans = Number(claimed?.quantity ?? 0);
      if (releasedCans > 0) await releaseClaim(actor, id, releasedCans, trx, "unit installed: unbuilt claim given back");
    }
    await trx("heater_units").where({ id, group_id: groupId }).update({ state: to, state_changed_at: trx.fn.now() });
    return releasedCans;
  });
  return { ...(await getHeaterUnit(groupId, id)), released };
}
