import "server-only";
import { conflict, notFound } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/queries";
import { db } from "@/lib/db";
import { ledgerCall, ledgerPayload, runLedgerFunction, type OwnRefusals } from "@/lib/ledger/post";
import { countOf } from "@/lib/plural";
import { getHeaterUnit } from "./queries";

const REFUSALS: OwnRefusals = {
  unitMoved: () => conflict("The unit moved to another drive meanwhile; try again."),
  alreadyArchived: () => conflict("That heater unit is already archived."),
  notArchived: () => conflict("That heater unit is not archived."),
  builtIn: (d) =>
    conflict(`${countOf(Number(d.builtIn), "can")} are already built into this unit: a real heater is kept, not archived. Step it through its states instead.`, {
      builtIn: Number(d.builtIn),
    }),
};

const RELEASE_NOTE = "unit archived: unbuilt claim given back";

/**
 * Archives a heater unit (archive = true) or restores it. One call of
 * heater_unit_archive (db/functions/heater_unit_archive.sql) locks the drive
 * and the unit, refuses a unit with cans built in, gives its unbuilt claims
 * back through the ledger (a `release` movement, undoable) and stamps the
 * unit, which then counts toward no target. Nothing in the ledger is removed.
 */
export async function setUnitArchived(actor: Actor, id: string, archive: boolean) {
  const groupId = actor.group.id;
  const unit = await db("heater_units").select("drive_id").where({ id, group_id: groupId }).first();
  if (!unit) throw notFound("That heater unit");
  const payload = {
    ...ledgerPayload(
      { groupId, driveId: unit.drive_id, actorId: actor.user.id, kind: "release", details: { heaterUnitId: id } },
      [],
      { unit: { id, action: "release" }, note: RELEASE_NOTE },
    ),
    archive,
  };
  const r = await runLedgerFunction<{ released: number | string; movementId: string | null }>(db, ledgerCall("heater_unit_archive", payload), REFUSALS);
  return { ...(await getHeaterUnit(groupId, id)), released: Number(r.released), movementId: r.movementId ?? null };
}
