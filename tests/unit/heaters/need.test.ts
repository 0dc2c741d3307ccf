import { describe, expect, it } from "vitest";
import { needRefusalMessage, unitNeed } from "@/lib/heaters/need";
import { mayActOnUnit, unitRefusal } from "@/lib/heaters/builder-rule";

// A unit's need is its cans plus its share of the drive's spare allowance
// (PRODUCT.md: target = Σ cans + spare, default 5 %). The share itself is the
// database's unit_spare (tests/integration/heaters/claim-need.test.ts).
describe("a unit's need", () => {
  it("adds the spare share and never goes below nothing left", () => {
    expect(unitNeed(132, 7, 100, 20)).toEqual({ cans: 132, spare: 7, need: 139, remaining: 19 });
    expect(unitNeed(132, 7, 130, 20).remaining).toBe(0);
  });

  it("says what is left in one message for the server and the form", () => {
    expect(needRefusalMessage({ remaining: 19, cans: 132, spare: 7 })).toBe(
      "This unit needs only 19 more cans (its 132 cans plus 7 spare). Claim 19 or fewer.",
    );
    expect(needRefusalMessage({ remaining: 1, cans: 1200, spare: 60 })).toMatch(/^This unit needs only 1 more can \(its 1,200 cans/);
    expect(needRefusalMessage({ remaining: 0, cans: 132, spare: 7 })).toMatch(/^This unit needs no more cans/);
  });
});

describe("who may act on a unit", () => {
  const mine = { builderId: "u-1", builderName: "Edda" };
  const theirs = { builderId: "u-2", builderName: "Pell" };
  const builder = { role: "builder" as const, userId: "u-1" };
  const organiser = { role: "organiser" as const, userId: "u-9" };

  it("lets a builder act only on the units they build", () => {
    for (const purpose of ["claim", "release", "builtIn", "state"] as const) {
      expect(mayActOnUnit(builder, mine, purpose)).toBe(true);
      expect(mayActOnUnit(builder, theirs, purpose)).toBe(false);
      expect(mayActOnUnit(builder, { builderId: null, builderName: null }, purpose)).toBe(false);
    }
    expect(unitRefusal(builder, theirs, "release")).toBe("This unit is built by Pell; only they or an organiser can release cans from it.");
  });

  it("keeps every power for organisers, and moving claims for them alone", () => {
    for (const purpose of ["claim", "release", "builtIn", "state", "moveClaims"] as const) expect(mayActOnUnit(organiser, theirs, purpose)).toBe(true);
    expect(mayActOnUnit(builder, mine, "moveClaims")).toBe(false);
    expect(mayActOnUnit({ role: "volunteer", userId: "u-1" }, mine, "claim")).toBe(false);
  });
});
