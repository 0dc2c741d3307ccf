import { describe, expect, it } from "vitest";
import type { ZodType } from "zod";
import { DATE_RANGE_MESSAGE, day, moment } from "@/lib/dates";
import { driveInput, pledgeInput } from "@/lib/drives/schemas";
import { haulInputSchema, ledgerFilterSchema, MIN_HAUL_WEIGHT_KG, processingInputSchema, recyclingInputSchema, sortInputSchema, UNDER_ONE_CAN } from "@/lib/ledger/schemas";
import { DEFAULT_GRAMS_PER_CAN } from "@/lib/ledger/estimate";
import { createRunInputSchema } from "@/lib/runs/schemas";

const ID = "6f1c2a9e-4b7d-4c1e-9a3b-2d5e8f7a1b2c";

function messageAt(schema: ZodType, input: unknown, field: string): string | undefined {
  const r = schema.safeParse(input);
  return r.success ? undefined : r.error.issues.find((i) => i.path.join(".") === field)?.message;
}

describe("the date window", () => {
  it.each(["2000-01-01", "2026-11-01", "2100-12-31", "2024-02-29"])("%s is a day", (v) => expect(day("bad").safeParse(v).success).toBe(true));
  it.each(["0000-01-01", "1900-06-01", "1999-12-31", "2101-01-01", "9999-12-31"])("%s is outside", (v) => expect(messageAt(day("bad"), v, "")).toBe(DATE_RANGE_MESSAGE));
  it.each(["2026-02-30", "2026-13-01", "26-11-01", "2026-11-01T00:00:00Z", ""])("%s keeps the schema's own message", (v) => expect(messageAt(day("bad", "impossible"), v, "")).toMatch(/^(bad|impossible)$/));
  it("is judged in UTC for moments with an offset", () => {
    expect(moment("bad").safeParse("2100-12-31T23:30:00+05:00").success).toBe(true);
    expect(messageAt(moment("bad"), "2100-12-31T23:30:00-05:00", "")).toBe(DATE_RANGE_MESSAGE);
    expect(messageAt(moment("bad"), "1999-12-31T23:59:59Z", "")).toBe(DATE_RANGE_MESSAGE);
    expect(messageAt(moment("bad"), "0000-01-01T00:00:00Z", "")).toBe(DATE_RANGE_MESSAGE);
    expect(messageAt(moment("bad"), "yesterday", "")).toBe("bad");
  });
});

describe("every schema that takes a date uses the window", () => {
  const drive = { name: "Winter drive", slug: "winter-drive", startsOn: "2026-11-01", endsOn: "2027-01-31", isPublic: true };
  const run = { driveId: ID, plannedOn: "2026-12-12", start: { lat: 47, lng: -8 }, dropPointIds: [ID], assigneeId: ID };
  const cases: [string, ZodType, Record<string, unknown>, string, "day" | "moment"][] = [
    ["drive start", driveInput, drive, "startsOn", "day"],
    ["drive end", driveInput, drive, "endsOn", "day"],
    ["pledge", pledgeInput, { dropPointId: ID, bags: 1, bringOn: "2026-11-20" }, "bringOn", "day"],
    ["run", createRunInputSchema, run, "plannedOn", "day"],
    ["haul", haulInputSchema, { dropPointId: ID, bags: 1 }, "hauledAt", "moment"],
    ["sort", sortInputSchema, { haulIds: [ID], good: 1 }, "sortedAt", "moment"],
    ["processing", processingInputSchema, { from: "good", to: "washed", quantity: 1 }, "occurredAt", "moment"],
    ["recycling", recyclingInputSchema, { quantity: 1 }, "occurredAt", "moment"],
    ["ledger filter from", ledgerFilterSchema, {}, "from", "day"],
    ["ledger filter to", ledgerFilterSchema, {}, "to", "day"],
  ];
  it.each(cases)("%s", (_what, schema, base, field, kind) => {
    for (const year of ["0000", "1900", "9999"]) {
      const value = kind === "day" ? `${year}-01-01` : `${year}-01-01T12:00:00Z`;
      // The drive's end must not come before its start, so both move together there.
      const input = field === "endsOn" ? { ...base, startsOn: "2026-01-01", endsOn: value } : { ...base, [field]: value };
      expect(messageAt(schema, input, field), `${field} = ${value}`).toBe(DATE_RANGE_MESSAGE);
    }
    const inside = kind === "day" ? "2026-12-20" : "2026-12-20T12:00:00Z";
    expect(schema.safeParse(field === "endsOn" ? { ...base, endsOn: "2027-01-31" } : { ...base, [field]: inside }).success).toBe(true);
  });
});

describe("a haul's weight", () => {
  const haul = (weightKg: number, bags = 0) => ({ dropPointId: ID, bags, weightKg });
  it("is at least one can's mass: 1 lb ÷ 34 (the figure lib/ledger/estimate.ts cites)", () => {
    expect(MIN_HAUL_WEIGHT_KG).toBeCloseTo(0.45359237 / 34, 9);
    expect(MIN_HAUL_WEIGHT_KG).toBe(DEFAULT_GRAMS_PER_CAN / 1000);
  });
  it.each([0.0004, 1e-6, 0.005, 0.0133])("%s kg is under one can", (kg) => {
    expect(messageAt(haulInputSchema, haul(kg), "weightKg")).toBe(UNDER_ONE_CAN);
    expect(messageAt(haulInputSchema, haul(kg, 3), "weightKg")).toBe(UNDER_ONE_CAN);
  });
  it("accepts one can's mass and more, and 0 kg beside bags", () => {
    expect(haulInputSchema.safeParse(haul(0.0134)).success).toBe(true);
    expect(haulInputSchema.safeParse(haul(6.5, 2)).success).toBe(true);
    expect(haulInputSchema.safeParse(haul(0, 2)).success).toBe(true);
  });
  it("keeps the negative-weight message for negative weights", () => {
    expect(messageAt(haulInputSchema, haul(-1, 1), "weightKg")).toBe("Weight can't be negative.");
  });
});
