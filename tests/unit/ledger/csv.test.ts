import { describe, expect, it } from "vitest";
import { ledgerCsv, ledgerCsvFileName, neutraliseCell } from "@/lib/ledger/csv";
import { localDay } from "@/lib/format/dates";

const LONDON = { timeZone: "Europe/London", locale: "en-GB" };
import type { LedgerRow } from "@/lib/ledger/ledger-row";

const row = (over: Partial<LedgerRow> = {}): LedgerRow => ({
  id: "132",
  movementId: "6f1c2b9e-0000-4000-8000-000000000001",
  kind: "sort",
  occurredAt: "2026-07-03T09:30:00.000Z",
  recordedAt: "2026-07-03T09:31:00.000Z",
  person: "Test volunteer",
  personId: "6f1c2b9e-0000-4000-8000-000000000002",
  drive: "Winter drive",
  driveId: "6f1c2b9e-0000-4000-8000-000000000003",
  dropPoint: "North porch",
  heaterUnit: null,
  from: null,
  to: "rejected",
  quantity: 4,
  reason: "wrongSize",
  isEstimate: false,
  reversesId: null,
  note: "",
  reversedById: null,
  reversalReason: null,
  ...over,
});

// OWASP, "CSV Injection" (https://owasp.org/www-community/attacks/CSV_Injection):
// cells beginning with = + - @ tab (0x09) or carriage return (0x0D) are prefixed
// with a single quote and the cell is wrapped in double quotes, inner quotes doubled.
describe("CSV cells a spreadsheet could run (OWASP CSV Injection)", () => {
  it.each(["=1+1", "+1", "-1", "@SUM(A1)", "\tx", "\rx"])("prefixes %j with a single quote", (v) => {
    expect(neutraliseCell(v)).toBe(`'${v}`);
  });
  it("leaves ordinary text alone, including a formula sign later in the cell", () => {
    expect(neutraliseCell("bags were wet")).toBe("bags were wet");
    expect(neutraliseCell("a=b")).toBe("a=b");
    expect(neutraliseCell("")).toBe("");
  });
  it("writes a volunteer's =HYPERLINK note as quoted text, not a live formula", () => {
    const csv = ledgerCsv([row({ note: '=HYPERLINK("http://evil.example","click")' })], LONDON);
    expect(csv).toContain(`"'=HYPERLINK(""http://evil.example"",""click"")"`);
    // No cell of the record starts with the bare formula.
    expect(csv).not.toMatch(/(^|,)=HYPERLINK/m);
  });
  it("neutralises every text column, e.g. a drop point named -1+1", () => {
    const csv = ledgerCsv([row({ dropPoint: "-1+1", person: "@admin" })], LONDON);
    expect(csv).toContain(`"'-1+1"`);
    expect(csv).toContain(`"'@admin"`);
  });
});

describe("CSV content", () => {
  it("puts the group's local time next to ISO UTC and human words for codes", () => {
    const [header, line] = ledgerCsv([row()], LONDON).trim().split(/\r?\n/);
    expect(header.split(",").slice(0, 5)).toEqual(["line", "occurred_at", "occurred_local (Europe/London)", "recorded_at", "recorded_local (Europe/London)"]);
    // British Summer Time in July: UTC+1 (IANA tz database, Europe/London).
    // The local column reads like every screen: CLDR's en-GB medium date and short time.
    expect(line).toContain('2026-07-03T09:30:00.000Z,"3 Jul 2026, 10:30",');
    expect(line).toContain(",into rejected,4,wrong size,");
    expect(line).not.toContain("wrongSize");
  });
  it("local time follows the zone: GMT in winter, and another zone's offset", () => {
    const at = "2026-11-30T23:30:00Z";
    expect(ledgerCsv([row({ occurredAt: at })], LONDON)).toContain(`${at},"30 Nov 2026, 23:30",`);
    // Central European Time is UTC+1 in winter (IANA tz database, Europe/Berlin): the next day.
    expect(ledgerCsv([row({ occurredAt: at })], { timeZone: "Europe/Berlin", locale: "en-GB" })).toContain(`${at},"1 Dec 2026, 00:30",`);
    expect(localDay(at, "Europe/Berlin")).toBe("2026-12-01");
    expect(localDay(at, "Europe/London")).toBe("2026-11-30");
  });
  it("names an undo by its line numbers", () => {
    const csv = ledgerCsv([row({ id: "140", kind: "reversal", reversesId: "132" }), row({ reversedById: "140" })], LONDON);
    expect(csv).toContain("undo of line 132");
    expect(csv.split(/\r?\n/)[0]).toContain("undone_by_line");
  });
  it("file name names the drive and the range", () => {
    expect(ledgerCsvFileName("winter-2026", "2026-11-01", "2026-11-30")).toBe("cantrove-ledger-winter-2026-2026-11-01-to-2026-11-30.csv");
    expect(ledgerCsvFileName(null, "2026-11-01", "2026-11-30")).toBe("cantrove-ledger-all-drives-2026-11-01-to-2026-11-30.csv");
  });
});
