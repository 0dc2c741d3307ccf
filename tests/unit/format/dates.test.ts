import { describe, expect, it } from "vitest";
import { formatAgo, formatDay, formatDayMonth, formatDayRange, formatLongDay, formatMoment, formatMomentDay, formatTime, localDay, steady } from "@/lib/format/dates";
import { isTimeZone } from "@/lib/format/look";

// CLDR date patterns (unicode.org/cldr, gregorian calendar), from memory: en-GB medium "d MMM y",
// short time "HH:mm", medium date-time "{date}, {time}"; en-US medium "MMM d, y", short time "h:mm a".
// Offsets from the IANA tz database: Europe/London GMT in winter and UTC+1 in summer (BST),
// America/New_York UTC−5 in winter, Pacific/Auckland UTC+13 in December (NZDT).
const LONDON = { locale: "en-GB", timeZone: "Europe/London" };
const NEW_YORK = { locale: "en-US", timeZone: "America/New_York" };

describe("calendar days", () => {
  it("one style for a day, spelled the CLDR way for the locale", () => {
    expect(formatDay("2026-12-02", LONDON)).toBe("2 Dec 2026");
    expect(formatDay("2026-12-02", NEW_YORK)).toBe("Dec 2, 2026");
    expect(formatLongDay("2027-03-01", LONDON)).toBe("1 March 2027");
    expect(formatDayMonth("2026-11-03", LONDON)).toBe("3 Nov");
  });
  it("never shifts a calendar day with a zone far from UTC", () => {
    expect(formatDay("2026-12-31", { locale: "en-NZ" })).toBe("31 Dec 2026");
    expect(formatDay("2027-01-01", { locale: "en-US" })).toBe("Jan 1, 2027");
  });
  it("writes a span with the shared parts once and plain spaces round the dash", () => {
    expect(formatDayRange("2026-11-01", "2026-12-31", LONDON)).toBe("1 Nov – 31 Dec 2026");
    expect(formatDayRange("2026-11-01", "2027-01-31", LONDON)).toBe("1 Nov 2026 – 31 Jan 2027");
    expect(formatDayRange("2026-11-01", "2026-11-01", LONDON)).toBe("1 Nov 2026");
  });
});

describe("moments on the group's clock", () => {
  it("puts a moment in the group's zone: GMT in winter, BST in summer", () => {
    expect(formatMoment("2026-12-02T13:55:00Z", LONDON)).toBe("2 Dec 2026, 13:55");
    expect(formatMoment("2026-07-03T09:30:00Z", LONDON)).toBe("3 Jul 2026, 10:30");
    expect(formatTime("2026-07-03T09:30:00Z", LONDON)).toBe("10:30");
  });
  it("uses a 12-hour clock where the locale does", () => {
    // CLDR 42+ writes a narrow no-break space (U+202F) before the day period; some ICU builds for
    // the web put a plain space back. Either is CLDR's "h:mm a"; steady() writes U+00A0 for the first.
    expect(formatMoment("2026-12-02T18:55:00Z", NEW_YORK)).toMatch(/^Dec 2, 2026, 1:55[ \u00a0]PM$/);
  });
  it("spells a date the same whichever ICU build renders it, so server and browser text agree", () => {
    // en-GB's short September is "Sept" in CLDR 38 and later, "Sep" before (from memory).
    expect(formatDay("2026-09-02", LONDON)).toBe("2 Sep 2026");
    expect(formatLongDay("2026-09-02", LONDON)).toBe("2 September 2026");
    expect(steady("1\u202fPM 1\u2009–\u20093 Sept")).toBe("1\u00a0PM 1 – 3 Sep");
  });
  it("finds the group's calendar day of a moment across midnight", () => {
    expect(localDay("2026-11-30T23:30:00Z", "Europe/London")).toBe("2026-11-30");
    expect(localDay("2026-11-30T23:30:00Z", "Pacific/Auckland")).toBe("2026-12-01");
    expect(localDay("2026-12-01T03:00:00Z", "America/New_York")).toBe("2026-11-30");
    expect(formatMomentDay("2026-11-30T23:30:00Z", { locale: "en-GB", timeZone: "Pacific/Auckland" })).toBe("1 Dec 2026");
  });
  it("says how long ago with CLDR's plural for the unit", () => {
    expect(formatAgo(1, "day")).toBe("1 day ago");
    expect(formatAgo(3, "hour")).toBe("3 hours ago");
  });
  it("knows an IANA zone from a made-up one", () => {
    expect(isTimeZone("Europe/London")).toBe(true);
    expect(isTimeZone("UTC")).toBe(true);
    expect(isTimeZone("Not/AZone")).toBe(false);
  });
});

describe("the drive page's small clock", () => {
  it("writes a moment exactly as the full date formatters do", async () => {
    const clock = await import("@/lib/format/clock");
    for (const look of [LONDON, NEW_YORK, { locale: "en-ZA", timeZone: "Africa/Johannesburg" }]) {
      for (const at of ["2026-12-02T13:55:00Z", "2026-07-03T09:30:00Z", "2026-09-02T23:59:00Z"]) expect(clock.formatMoment(at, look)).toBe(formatMoment(at, look));
    }
  });
});
