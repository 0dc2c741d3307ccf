import "server-only";
import { localDay } from "@/lib/format/dates";
import { groupLook } from "@/lib/format/group-look-queries";
import { ledgerCsv, ledgerCsvFileName } from "./csv";
import { exportDrive, listLedgerPage } from "./ledger-list";
import type { LedgerFilter } from "./schemas";

/** The CSV of every line matching the filters, and a file name naming the drive and the range. */
export async function exportLedger(groupId: string, f: LedgerFilter) {
  const [look, drive] = await Promise.all([groupLook(groupId), exportDrive(groupId, f.driveId)]);
  const zone = look.timeZone;
  const { rows } = await listLedgerPage(groupId, { ...f, limit: undefined }, 100_000, zone, { count: false });
  // The range is the one asked for; where open, the lines' own first and last local day.
  const day = (iso: string) => localDay(iso, zone);
  const from = f.from ?? (rows.length ? day(rows[rows.length - 1].occurredAt) : drive?.startsOn ?? day(new Date().toISOString()));
  const to = f.to ?? (rows.length ? day(rows[0].occurredAt) : drive?.endsOn ?? day(new Date().toISOString()));
  return { csv: ledgerCsv(rows, look), fileName: ledgerCsvFileName(drive?.slug ?? null, from, to) };
}
