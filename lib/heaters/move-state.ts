import "server-only";
import { AppError, conflict, notFound } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/queries";
import { db } from "@/lib/db";
import { ledgerCall, ledgerPayload, runLedgerFunction, type OwnRefusals } from "@/lib/ledger/post";
import { getHeaterUnit } from "./queries";
import { checkStateMove } from "./states";
import type { HeaterState } from "./unit-schemas";

/** A unit whose state changed between our read and the function's lock; we check the move again from `state`. */
class StateChanged extends AppError {
  constructor(readonly state: HeaterState) {
    super("conflict", "The unit's state changed meanwhile; try again.", { details: { state } });
  }
}

const REFUSALS: OwnRefusals = {
  unitMoved: () => conflict("The unit moved to another drive meanwhile; try again."),
  stateChanged: (d) => new StateChanged(d.state as HeaterState),
};

const RELEASE_NOTE = "unit installed: unbuilt claim given back";
/** Each retry follows someone else's move of the same unit; three in a row is a unit too busy to move now. */
const TRIES = 3;

/**
 * Moves a unit along planned → claiming → building → installed. The rule
 * (checkStateMove, role-dependent) is checked here on the state read without a
 * lock; one call of heater_unit_move (db/functions/heater_units.sql) then
 * locks the drive and the unit, refuses if the state is no longer the one
 * checked (we check again from the new state, so the answer is the one the
 * rule gives now), gives an installed unit's unbuilt claims back to the drive
 * (a `release` movement, undoable like any other) and moves the unit, so no
 * lock is held across a round trip.
 */
export async function moveUnitState(actor: Actor, id: string, to: HeaterState) {
  const groupId = actor.group.id;
  const unit = await db("heater_units").select("state", "drive_id").where({ id, group_id: groupId }).first();
  if (!unit) throw notFound("That heater unit");
  let from: HeaterState = unit.state;
  for (let attempt = 1; ; attempt++) {
    const verdict = checkStateMove(from, to, actor.role);
    if (!verdict.ok) throw new AppError("conflict", verdict.reason, { details: { state: from } });
    // A unit on no drive has a null driveId: the function then locks the unit alone and releases nothing.
    const payload = ledgerPayload(
      { groupId, driveId: unit.drive_id, actorId: actor.user.id, kind: "release", details: { heaterUnitId: id } },
      [],
      { unit: { id, action: "release" }, move: { from, to }, note: RELEASE_NOTE },
    );
    try {
      const r = await runLedgerFunction<{ released: number | string }>(db, ledgerCall("heater_unit_move", payload), REFUSALS);
      return { ...(await getHeaterUnit(groupId, id)), released: Number(r.released) };
    } catch (error) {
      if (!(error instanceof StateChanged)) throw error;
      if (attempt === TRIES) throw conflict("Others are moving this unit right now; reload it and try again.", { state: error.state });
      from = error.state;
    }
  }
}
