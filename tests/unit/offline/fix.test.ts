import { describe, expect, it } from "vitest";
import { correctedCopy, fixBoxes, fixableFields, parseFix } from "@/lib/offline/fix";
import { newOutboxItem } from "@/lib/ledger/browser-queue";

const entered = new Date("2026-12-04T10:42:00.000Z");
const haul = newOutboxItem("/api/drives/d/hauls", { dropPointId: "p", bags: 600, weightKg: null }, "Haul: 600 bags from North porch", entered, "key-1");

describe("fixing a refused entry in place", () => {
  it("offers the numbers the server named, else every number the entry carries", () => {
    expect(fixableFields(haul.body, { bags: "That is more bags than one pickup holds." })).toEqual(["bags"]);
    expect(fixableFields(haul.body, undefined)).toEqual(["bags", "weightKg"]);
    expect(fixableFields({ reason: "closed" }, { reason: "too short" })).toEqual([]);
    // The server named only a field no box corrects (a sort's rejected cans): no box for another number.
    expect(fixableFields({ haulIds: ["h"], good: 40, rejected: { dented: 900 } }, { rejected: "More rejected cans than the hauls held." })).toEqual([]);
  });

  it("speaks the group's units: an imperial group's weight box takes pounds and stores kilograms", () => {
    // 1 lb = 0.45359237 kg exactly (international yard and pound agreement, 1959; NIST SP 811 appendix B).
    expect(parseFix({ weightKg: "22" }, "imperial")).toEqual({ ok: true, values: { weightKg: 9.979 } });
    expect(parseFix({ weightKg: "22" }, "metric")).toEqual({ ok: true, values: { weightKg: 22 } });
    const lb = fixBoxes("imperial").weightKg!;
    expect(lb.label).toBe("Weight (lb)");
    expect(lb.shown(9.979)).toBe(22);
    expect(fixBoxes("metric").weightKg!.label).toBe("Weight (kg)");
  });

  it("reads each box by its own rules and refuses what is not a number", () => {
    expect(parseFix({ bags: "6" })).toEqual({ ok: true, values: { bags: 6 } });
    const bad = parseFix({ bags: "6.5", weightKg: "abc" });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(Object.keys(bad.errors).sort()).toEqual(["bags", "weightKg"]);
  });

  it("keeps the time of entry, takes a new key and the new number, and starts its tries afresh", () => {
    const copy = correctedCopy({ ...haul, attempts: 3, lastError: "x" }, { bags: 6 }, "key-2");
    expect(copy.key).toBe("key-2");
    expect(copy.createdAt).toBe(entered.toISOString());
    expect(copy.body).toEqual({ happenedAt: entered.toISOString(), dropPointId: "p", bags: 6, weightKg: null });
    expect(copy.attempts).toBe(0);
    expect(copy.label).toBe("Haul: 600 bags from North porch (corrected: bags 6)");
    // Corrected twice: one note, the latest.
    expect(correctedCopy(copy, { bags: 5 }, "key-3").label).toBe("Haul: 600 bags from North porch (corrected: bags 5)");
  });
});
