import "server-only";
import { UTApi } from "uploadthing/server";
import { conflict } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/queries";
import { db } from "@/lib/db";
import { ledgerCall, runLedgerFunction, type OwnRefusals } from "@/lib/ledger/post";
import { countOf, noun, plural } from "@/lib/plural";
import { recordLabel, recordNoun, type RecordKind } from "./kinds";

const refusals = (kind: RecordKind): OwnRefusals => ({
  alreadyArchived: () => conflict(`${recordLabel(kind)} is already archived.`),
  notArchived: () => conflict(`${recordLabel(kind)} is not archived.`),
  referenced: (d) => {
    const ledger = Number(d.ledger);
    const runs = Number(d.runStops);
    const why = [
      ledger ? `the ledger holds ${countOf(ledger, noun("entry", "entries"))} for it` : "",
      runs ? `${countOf(runs, kind === "drive" ? "pickup run" : "pickup-run stop")} ${plural(runs, noun("names", "name"))} it` : "",
    ]
      .filter(Boolean)
      .join(" and ");
    return conflict(`This ${recordNoun(kind)} cannot be deleted: ${why}, and the ledger is never deleted. Archive it instead.`, { ledger, runStops: runs });
  },
});

/** Archives (true) or restores (false) one record: record_archive stamps it under a row lock (db/functions/records.sql). */
export async function setRecordArchived(actor: Actor, kind: RecordKind, id: string, archive: boolean) {
  await runLedgerFunction(db, ledgerCall("record_archive", { groupId: actor.group.id, kind, id, archive }), refusals(kind));
  return { id, kind, archived: archive };
}

/**
 * Deletes one record that no ledger line (nor pickup run) refers to. record_delete checks and deletes
 * under the drive's lock; the photos' files leave the upload host after the commit (best effort: a
 * file left there is no longer listed or linked anywhere).
 */
export async function deleteRecord(actor: Actor, kind: RecordKind, id: string) {
  const r = await runLedgerFunction<{ fileKeys: string[] }>(db, ledgerCall("record_delete", { groupId: actor.group.id, kind, id }), refusals(kind));
  if (r.fileKeys.length) {
    try {
      await new UTApi().deleteFiles(r.fileKeys);
    } catch (error) {
      console.error(`[records] could not remove ${r.fileKeys.length} deleted photo(s) from the upload host:`, (error as Error).message);
    }
  }
  return { id, kind, deleted: true };
}
