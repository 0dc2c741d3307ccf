import { describe, expect, it } from "vitest";
import { driveProgress, type DriveProgressInput } from "@/lib/drives/progress";
import { finishText as finishWith, heatersCoveredText, paceText, remainingText } from "@/lib/drives/progress-wording";
import { formatDay } from "@/lib/format/dates";

const finishText = (f: Parameters<typeof finishWith>[0], look = { locale: "en-GB" }) => finishWith(f, (d) => formatDay(d, look));
import { example, noStages } from "./progress-example";

// The worked example (progress-example.ts: target 462, 250 good, 10 a day → 6 April),
// with its 140 cans of the last 14 days on one day and the drive's dates set.
const running: DriveProgressInput = {
  ...example,
  hauledEstimate: 0,
  daily: [{ date: "2025-03-10", goodCans: 140 }],
  startsOn: "2025-03-01",
  endsOn: "2025-04-30",
};

describe("the drive's finish, said honestly", () => {
  it("gives the paced date for a running drive", () => {
    const p = driveProgress(running);
    expect(p.finish).toEqual({ kind: "expected", date: "2025-04-06", afterEnd: false, endsOn: "2025-04-30" });
    // Days as every screen writes them: CLDR en-GB medium date.
    expect(finishText(p.finish)).toBe("6 Apr 2025");
    expect(finishText(p.finish, { locale: "en-US" })).toBe("Apr 6, 2025");
  });

  it("says when the pace runs past the drive's end", () => {
    const p = driveProgress({ ...running, endsOn: "2025-03-31" });
    expect(finishText(p.finish)).toBe("6 Apr 2025, after the drive ends on 31 Mar 2025");
  });

  it("promises no date without a pace", () => {
    const p = driveProgress({ ...running, daily: [] });
    expect(p.expectedFinish).toBeNull();
    expect(finishText(p.finish)).toBe("No pace yet: nothing counted in the last 14 days");
  });

  it("promises no date after the drive has ended", () => {
    const p = driveProgress({ ...running, today: "2025-05-02" });
    expect(p.expectedFinish).toBeNull();
    expect(finishText(p.finish)).toBe("The drive ended on 30 Apr 2025");
  });

  it("promises no date before the drive starts", () => {
    const p = driveProgress({ ...running, today: "2025-02-20" });
    expect(p.expectedFinish).toBeNull();
    expect(finishText(p.finish)).toBe("No pace yet: the drive starts on 1 Mar 2025");
  });

  it("says no heaters are planned, never 'finished today', for a drive with no target", () => {
    const p = driveProgress({ ...running, unitCans: [], stages: noStages });
    expect(p.expectedFinish).toBeNull();
    expect(p.finish).toEqual({ kind: "noTarget" });
    expect(finishText(p.finish)).toBe("No heaters planned yet");
  });

  it("says the target is reached, without pretending a finish date", () => {
    const p = driveProgress({ ...running, stages: { ...noStages, good: 500 } });
    expect(p.expectedFinish).toBeNull();
    expect(finishText(p.finish)).toBe("Target reached");
  });
});

describe("progress sentences", () => {
  it("never says '0 of 0 heaters'", () => {
    expect(heatersCoveredText(0, 0)).toBe("No heaters planned yet");
    expect(heatersCoveredText(0, 1)).toBe("Good cans for 0 of 1 heater");
    expect(heatersCoveredText(2, 3)).toBe("Good cans for 2 of 3 heaters");
  });

  it("never says 'Target reached' without a target", () => {
    expect(remainingText({ cans: 0, heaters: 0 }, 0)).toBe("The target appears once the organisers plan a heater.");
    expect(remainingText({ cans: 462, heaters: 3 }, 1)).toBe("1 good can still to find.");
    expect(remainingText({ cans: 462, heaters: 3 }, 212)).toBe("212 good cans still to find.");
    expect(remainingText({ cans: 462, heaters: 3 }, 0)).toBe("Target reached — thank you!");
  });

  it("spells the pace with its plurals", () => {
    expect(paceText({ cansPerDay: 1, windowDays: 1 })).toBe("1 good can a day over the last 1 day");
    expect(paceText({ cansPerDay: 10, windowDays: 14 })).toBe("10 good cans a day over the last 14 days");
    expect(paceText({ cansPerDay: 0, windowDays: 0 })).toBe("no pace before the drive starts");
  });
});
