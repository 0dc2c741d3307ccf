import { stringify } from "csv-stringify/sync";
import { formatMoment } from "@/lib/format/dates";
import type { Look } from "@/lib/format/look";
import { entryLabel, moveLabel, reasonLabel, stageLabel } from "./labels";
import type { LedgerRow } from "./ledger-row";

// The ledger's CSV export: human words for codes (from ./labels), the group's
// local time next to ISO UTC, and no cell a spreadsheet would run as a formula.

/**
 * OWASP, "CSV Injection" (owasp.org/www-community/attacks/CSV_Injection): a cell
 * starting with = + - @ tab (0x09) or carriage return (0x0D) may be run as a
 * formula by a spreadsheet. Prefix such a cell with a single quote so it is
 * read as text; the caller quotes the cell and doubles inner quotes.
 */
const FORMULA_START = /^[=+\-@\t\r]/;

export function neutraliseCell(value: string): string {
  return FORMULA_START.test(value) ? `'${value}` : value;
}

// The *_at columns are the machine's (ISO 8601, UTC); the *_local columns are
// for people, in the style of every screen ("3 Nov 2026, 14:05", lib/format).
type Clock = Pick<Look, "timeZone" | "locale">;

export function ledgerCsvColumns(timeZone: string) {
  return [
    { key: "line", header: "line" },
    { key: "occurredAt", header: "occurred_at" },
    { key: "occurredLocal", header: `occurred_local (${timeZone})` },
    { key: "recordedAt", header: "recorded_at" },
    { key: "recordedLocal", header: `recorded_local (${timeZone})` },
    { key: "entry", header: "entry" },
    { key: "drive", header: "drive" },
    { key: "dropPoint", header: "drop_point" },
    { key: "heaterUnit", header: "heater_unit" },
    { key: "from", header: "from_stage" },
    { key: "to", header: "to_stage" },
    { key: "move", header: "move" },
    { key: "quantity", header: "quantity" },
    { key: "reason", header: "reason" },
    { key: "isEstimate", header: "estimate" },
    { key: "person", header: "recorded_by" },
    { key: "reversesId", header: "reverses_line" },
    { key: "reversedById", header: "undone_by_line" },
    { key: "movementId", header: "movement" },
    { key: "note", header: "note" },
  ];
}

export function ledgerCsv(rows: LedgerRow[], look: Clock): string {
  const timeZone = look.timeZone;
  const records = rows.map((r) => ({
    line: r.id,
    occurredAt: r.occurredAt,
    occurredLocal: formatMoment(r.occurredAt, look),
    recordedAt: r.recordedAt,
    recordedLocal: formatMoment(r.recordedAt, look),
    entry: entryLabel(r.kind, r.reversesId),
    drive: r.drive,
    dropPoint: r.dropPoint ?? "",
    heaterUnit: r.heaterUnit ?? "",
    from: stageLabel(r.from),
    to: stageLabel(r.to),
    move: moveLabel(r.from, r.to),
    quantity: r.quantity,
    reason: reasonLabel(r.reason),
    isEstimate: r.isEstimate,
    person: r.person,
    reversesId: r.reversesId ?? "",
    reversedById: r.reversedById ?? "",
    movementId: r.movementId,
    note: r.note,
  }));
  return stringify(records, {
    header: true,
    columns: ledgerCsvColumns(timeZone),
    cast: {
      boolean: (v) => (v ? "yes" : "no"),
      // Every text cell goes through the OWASP rule; a neutralised one is always quoted.
      string: (v) => {
        const safe = neutraliseCell(v);
        return safe === v ? v : { value: safe, quoted: true };
      },
    },
  });
}

/** cantrove-ledger-<drive-slug>-2026-11-01-to-2026-11-30.csv */
export function ledgerCsvFileName(driveSlug: string | null, from: string, to: string): string {
  const safe = (s: string) => s.replace(/[^a-z0-9-]+/gi, "-").replace(/^-+|-+$/g, "").toLowerCase() || "drive";
  return `cantrove-ledger-${driveSlug ? safe(driveSlug) : "all-drives"}-${safe(from)}-to-${safe(to)}.csv`;
}
