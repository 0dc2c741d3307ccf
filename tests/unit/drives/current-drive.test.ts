import { describe, expect, it } from "vitest";
import { defaultDrive, driveTiming, groupByTiming, longDay, pickDrive, spanText, timingWarning, type DriveSpan } from "@/lib/drives/current-drive";

// The rule a page uses to open on a drive when the person has not chosen one.
// Calendar facts below (2027 is not a leap year; a drive's last day counts as
// running) are common practice, no published source.
const drive = (id: string, startsOn: string, endsOn: string, name = id): DriveSpan => ({ id, name, startsOn, endsOn });

const past = drive("past", "2026-08-15", "2026-10-15");
const running = drive("running", "2026-11-01", "2027-01-31");
const future = drive("future", "2027-03-01", "2027-05-31");
const today = "2026-12-03";

describe("defaultDrive", () => {
  it("takes the drive running today over a newer future one and an older past one, in any order", () => {
    for (const order of [[future, running, past], [past, running, future], [running, future, past]]) {
      expect(defaultDrive(order, today)?.id).toBe("running");
    }
  });

  it("counts the first and last day as running", () => {
    expect(defaultDrive([future, running], "2026-11-01")?.id).toBe("running");
    expect(defaultDrive([future, running], "2027-01-31")?.id).toBe("running");
    expect(defaultDrive([future, running], "2027-02-01")?.id).toBe("future");
  });

  it("takes the one that started latest when several are running", () => {
    const autumn = drive("autumn", "2026-09-01", "2026-12-31");
    const late = drive("late", "2026-11-20", "2026-12-10");
    expect(defaultDrive([autumn, running, late, future], today)?.id).toBe("late");
  });

  it("breaks a tie of start days by name, whatever the order", () => {
    const a = drive("a", "2026-11-01", "2026-12-31", "Alder hall");
    const b = drive("b", "2026-11-01", "2027-02-28", "Birch hall");
    expect(defaultDrive([b, a], today)?.id).toBe("a");
    expect(defaultDrive([a, b], today)?.id).toBe("a");
  });

  it("takes the next to start when none is running", () => {
    const later = drive("later", "2027-09-01", "2027-10-31");
    expect(defaultDrive([later, past, future], "2027-02-10")?.id).toBe("future");
  });

  it("takes the most recently ended when all have ended", () => {
    expect(defaultDrive([past, running], "2027-06-01")?.id).toBe("running");
    expect(defaultDrive([past], "2027-06-01")?.id).toBe("past");
  });

  it("has nothing to offer when the group has no drives", () => {
    expect(defaultDrive([], today)).toBeUndefined();
  });
});

describe("pickDrive", () => {
  it("keeps the first preferred id that is one of the drives, else falls back to the rule", () => {
    expect(pickDrive([running, future], today, "future")?.id).toBe("future");
    expect(pickDrive([running, future], today, undefined, "future")?.id).toBe("future");
    expect(pickDrive([running, future], today, "past", "future")?.id).toBe("future");
    // A remembered drive that is gone, or another group's, is not among the drives.
    expect(pickDrive([running, future], today, null, "gone")?.id).toBe("running");
  });
});

describe("the words shown beside the form", () => {
  it("says whether the drive runs today", () => {
    expect(driveTiming(running, today)).toBe("running");
    expect(driveTiming(future, today)).toBe("upcoming");
    expect(driveTiming(past, today)).toBe("ended");
    expect(timingWarning(running, today)).toBeNull();
    expect(timingWarning(future, today)).toBe("This drive starts on 1 March 2027.");
    expect(timingWarning(past, today)).toBe("This drive ended on 15 October 2026.");
  });

  it("writes the span with the year once, or twice across a new year", () => {
    expect(spanText(drive("x", "2026-11-01", "2026-12-31"))).toBe("1 Nov – 31 Dec 2026");
    expect(spanText(running)).toBe("1 Nov 2026 – 31 Jan 2027");
    expect(longDay("2027-09-09")).toBe("9 September 2027");
  });
});

describe("groupByTiming", () => {
  it("judges each drive against its own group's day, so the same dates can fall in different groups", () => {
    // Two groups either side of midnight: one is already on 1 Nov, the other still on 31 Oct.
    const east = { ...drive("east", "2026-11-01", "2026-11-30"), today: "2026-11-01" };
    const west = { ...drive("west", "2026-11-01", "2026-11-30"), today: "2026-10-31" };
    const grouped = groupByTiming([west, east]);
    expect(grouped.running.map((d) => d.id)).toEqual(["east"]);
    expect(grouped.upcoming.map((d) => d.id)).toEqual(["west"]);
    expect(grouped.ended).toEqual([]);
  });

  it("puts the soonest start first among upcoming drives and the latest end first among the others", () => {
    const t = (d: DriveSpan) => ({ ...d, today });
    const soon = drive("soon", "2026-12-10", "2027-01-10");
    const grouped = groupByTiming([past, future, soon, running, drive("old", "2026-01-01", "2026-02-01")].map(t));
    expect(grouped.upcoming.map((d) => d.id)).toEqual(["soon", "future"]);
    expect(grouped.ended.map((d) => d.id)).toEqual(["past", "old"]);
    expect(grouped.running.map((d) => d.id)).toEqual(["running"]);
  });
});
