import "server-only";
import { ledgerCsv, ledgerCsvFileName, localTime } from "./csv";
import { exportDrive, groupTimeZone, listLedgerPage } from "./ledger-list";
import type { LedgerFilter } from "./schemas";

/** The CSV of every line matching the filters, and a file name naming the drive and the range. */
export async function exportLedger(groupId: string, f: LedgerFilter) {
  const [zone, drive] = await Promise.all([groupTimeZone(groupId), exportDrive(groupId, f.driveId)]);
  const { rows } = await listLedgerPage(groupId, { ...f, limit: undefined }, 100_000, zone);
  // The range is the one asked for; where open, the lines' own first and last local day.
  const day = (iso: string) => localTime(iso, zone).slice(0, 10);
  const from = f.from ?? (rows.length ? day(rows[rows.length - 1].occurredAt) : drive?.startsOn ?? day(new Date().toISOString()));
  const to = f.to ?? (rows.length ? day(rows[0].occurredAt) : drive?.endsOn ?? day(new Date().toISOString()));
  return { csv: ledgerCsv(rows, zone), fileName: ledgerCsvFileName(drive?.slug ?? null, from, to) };
}
