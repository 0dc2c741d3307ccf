import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/api/errors";
import { entryTime, entryTimeProblem, receivedLater, sentLabel } from "@/lib/ledger/entry-time";

const now = new Date("2026-12-02T16:00:00Z");
const at = (iso: string) => new Date(iso);

describe("entryTimeProblem", () => {
  it("accepts a time hours ago on a running drive, and a phone up to 5 minutes fast", () => {
    expect(entryTimeProblem(at("2026-12-02T10:00:00Z"), now, "2026-11-01")).toBeNull();
    expect(entryTimeProblem(at("2026-12-02T16:05:00Z"), now, "2026-11-01")).toBeNull();
  });

  it("refuses the future beyond the clock skew", () => {
    expect(entryTimeProblem(at("2026-12-02T16:05:01Z"), now, "2026-11-01")).toMatch(/in the future/);
  });

  it("refuses a time before the drive's start day in every time zone (UTC+14 is the earliest, from memory)", () => {
    expect(entryTimeProblem(at("2026-10-31T10:00:00Z"), now, "2026-11-01")).toBeNull(); // already 1 Nov at UTC+14
    expect(entryTimeProblem(at("2026-10-31T09:59:59Z"), now, "2026-11-01")).toMatch(/before the drive started \(2026-11-01\)/);
  });

  it("refuses absurdly old times and non-times", () => {
    expect(entryTimeProblem(at("2020-01-01T00:00:00Z"), now, "2019-01-01")).toMatch(/five years/);
    expect(entryTimeProblem(new Date("nonsense"), now, "2026-11-01")).toMatch(/Use a date/);
  });
});

describe("entryTime", () => {
  it("is now when no time was given, the given time when it is in bounds", () => {
    expect(entryTime(undefined, "happenedAt", "2026-11-01", now)).toBe(now);
    expect(entryTime("2026-12-02T10:00:00Z", "happenedAt", "2026-11-01", now).toISOString()).toBe("2026-12-02T10:00:00.000Z");
  });

  it("is a 422 on the named field otherwise", () => {
    try {
      entryTime("2027-01-01T00:00:00Z", "happenedAt", "2026-11-01", now);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(AppError);
      expect((e as AppError).status).toBe(422);
      expect((e as AppError).fields?.happenedAt).toMatch(/in the future/);
    }
  });
});

const UTC = { timeZone: "UTC", locale: "en-GB" };

describe("sentLabel", () => {
  it("says when a line was received if that is over a minute after it happened", () => {
    expect(receivedLater("2026-12-02T10:00:00Z", "2026-12-02T10:01:00Z")).toBe(false);
    expect(sentLabel("2026-12-02T10:00:00Z", "2026-12-02T10:00:40Z", UTC)).toBeNull();
    expect(sentLabel("2026-12-02T10:00:00Z", "2026-12-02T16:00:00Z", UTC)).toBe("sent 16:00");
    expect(sentLabel("2026-12-02T10:00:00Z", "2026-12-03T08:30:00Z", UTC)).toBe("sent 3 Dec 2026, 08:30");
  });
});
