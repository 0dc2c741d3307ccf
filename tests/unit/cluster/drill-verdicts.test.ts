import { describe, expect, it } from "vitest";
import { drillVerdicts, type DrillResults } from "@/scripts/lib/cluster-drills";

// `npm run cluster -- --drill` judges each drill by the rules of the issue
// (README "How it scales"): no stale read across servers, the standby answers
// public reads, under 1 % errors and no acknowledged write lost when a server
// dies, every public page answered with the standby down, every acknowledged
// write on the promoted standby.
const good: DrillResults = {
  freshAcrossServers: { rounds: 30, stale: 0 },
  readsOnStandby: { reads: 80, standbySessionsThatRanPublicReads: 2, standbyIsInRecovery: true },
  killOneServer: { requests: 2876, errors: 0, errorRate: 0, acknowledged: 722, acknowledgedFound: 722 },
  replicaDown: { reads: 40, ok: 40 },
  failOver: { acknowledged: 755, foundOnPromoted: 755, missing: [], promotedIsPrimary: true, writeAfterFailOver: 201 },
};

describe("drill verdicts", () => {
  it("a run like the one measured on 4 Dec passes all five", () => {
    expect(drillVerdicts(good).map((v) => v.passed)).toEqual([true, true, true, true, true]);
  });

  it.each([
    ["(1)", { freshAcrossServers: { rounds: 30, stale: 1 } }],
    ["(2)", { readsOnStandby: { reads: 80, standbySessionsThatRanPublicReads: 0, standbyIsInRecovery: true } }],
    ["(3)", { killOneServer: { requests: 1000, errors: 10, errorRate: 0.01, acknowledged: 200, acknowledgedFound: 200 } }],
    ["(3)", { killOneServer: { requests: 1000, errors: 0, errorRate: 0, acknowledged: 200, acknowledgedFound: 199 } }],
    ["(5)", { replicaDown: { reads: 40, ok: 39 } }],
    ["(4)", { failOver: { acknowledged: 755, foundOnPromoted: 754, missing: ["x"], promotedIsPrimary: true, writeAfterFailOver: 201 } }],
    ["(4)", { failOver: { acknowledged: 755, foundOnPromoted: 755, missing: [], promotedIsPrimary: true, writeAfterFailOver: 503 } }],
  ] as const)("drill %s fails on its own bad result and only it", (drill, change) => {
    const verdicts = drillVerdicts({ ...good, ...change } as DrillResults);
    expect(verdicts.filter((v) => !v.passed).map((v) => v.drill.slice(0, 3))).toEqual([drill]);
  });
});
