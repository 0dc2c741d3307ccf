import { describe, expect, it } from "vitest";
import { calendarDateIn, haulDayMismatch, isOpenOnDate, isoWeekday, openingHoursSchema } from "@/lib/drives/opening-hours";

// Reference: ISO 8601 weekday numbering (1 = Monday … 7 = Sunday). The weekday of
// each date is cross-checked against Intl.DateTimeFormat (ECMA-402), not our own arithmetic.
function intlIsoWeekday(date: string): number {
  const name = new Intl.DateTimeFormat("en-GB", { weekday: "long", timeZone: "UTC" }).format(new Date(`${date}T12:00:00Z`));
  return ["Monday", "Tuesday", "Wednesday", "Thursday", "Friday", "Saturday", "Sunday"].indexOf(name) + 1;
}

describe("isoWeekday", () => {
  it("matches Intl for a spread of dates, including leap days and year ends", () => {
    for (const d of ["2026-12-03", "2026-12-05", "2026-12-06", "2024-02-29", "2000-01-01", "2026-12-31", "2027-01-01", "1999-12-31"]) {
      expect(isoWeekday(d)).toBe(intlIsoWeekday(d));
    }
  });
  it("knows 3 December 2026 is a Thursday (ISO day 4) and 6 December a Sunday (ISO day 7)", () => {
    expect(isoWeekday("2026-12-03")).toBe(4);
    expect(isoWeekday("2026-12-06")).toBe(7);
  });
  it("refuses dates that do not exist", () => {
    expect(() => isoWeekday("2026-02-30")).toThrow();
    expect(() => isoWeekday("3 Dec")).toThrow();
  });
});

describe("isOpenOnDate", () => {
  const weekendsOnly = [{ days: [6, 7], opens: "10:00", closes: "14:00" }];
  it("says a weekend-only drop point is closed on a Thursday and open on a Saturday", () => {
    expect(isOpenOnDate(weekendsOnly, "2026-12-03")).toBe(false);
    expect(isOpenOnDate(weekendsOnly, "2026-12-05")).toBe(true);
    expect(isOpenOnDate(weekendsOnly, "2026-12-06")).toBe(true);
  });
  it("answers unknown (null) when no structured hours are recorded", () => {
    expect(isOpenOnDate(null, "2026-12-03")).toBeNull();
    expect(isOpenOnDate([], "2026-12-03")).toBeNull();
  });
  it("combines several spans", () => {
    const h = [{ days: [1], opens: "09:00", closes: "12:00" }, { days: [4], opens: "16:00", closes: "18:00" }];
    expect(isOpenOnDate(h, "2026-11-30")).toBe(true); // Monday
    expect(isOpenOnDate(h, "2026-12-03")).toBe(true); // Thursday
    expect(isOpenOnDate(h, "2026-12-01")).toBe(false); // Tuesday
  });
});

describe("openingHoursSchema", () => {
  it("accepts valid spans and refuses bad days, times and reversed spans", () => {
    expect(openingHoursSchema.safeParse([{ days: [1, 2], opens: "09:00", closes: "17:30" }]).success).toBe(true);
    expect(openingHoursSchema.safeParse([{ days: [0], opens: "09:00", closes: "17:00" }]).success).toBe(false);
    expect(openingHoursSchema.safeParse([{ days: [8], opens: "09:00", closes: "17:00" }]).success).toBe(false);
    expect(openingHoursSchema.safeParse([{ days: [], opens: "09:00", closes: "17:00" }]).success).toBe(false);
    expect(openingHoursSchema.safeParse([{ days: [1], opens: "9am", closes: "17:00" }]).success).toBe(false);
    expect(openingHoursSchema.safeParse([{ days: [1], opens: "17:00", closes: "09:00" }]).success).toBe(false);
  });
});

describe("calendarDateIn / haulDayMismatch", () => {
  // 23:30 UTC on 3 Dec is already 4 Dec in Auckland (UTC+13 in December) and still 3 Dec in London.
  const late = new Date("2026-12-03T23:30:00Z");
  it("reads the calendar date in the group's time zone (IANA tz via Intl)", () => {
    expect(calendarDateIn(late, "Europe/London")).toBe("2026-12-03");
    expect(calendarDateIn(late, "Pacific/Auckland")).toBe("2026-12-04");
  });
  it("flags a haul logged today on a run dated tomorrow, and not one logged on the day", () => {
    expect(haulDayMismatch("2026-12-04", late, "Europe/London")).toBe(true);
    expect(haulDayMismatch("2026-12-04", late, "Pacific/Auckland")).toBe(false);
  });
});

describe("day names and the drop-point form's field", () => {
  // Reference: schema.org OpeningHoursSpecification's dayOfWeek takes the DayOfWeek
  // members https://schema.org/Monday … https://schema.org/Sunday; ISO 8601 numbers
  // them 1 (Monday) to 7 (Sunday). Our labels must be those names in that order.
  it("labels ISO weekdays 1–7 with schema.org's DayOfWeek names", async () => {
    const { ISO_WEEKDAY_LABELS } = await import("@/lib/drives/opening-hours");
    expect([1, 2, 3, 4, 5, 6, 7].map((d) => ISO_WEEKDAY_LABELS[d])).toEqual(["Monday", "Tuesday", "Wednesday", "Thursday", "Friday", "Saturday", "Sunday"]);
  });
  it("words days and spans compactly", async () => {
    const { describeDays, describeOpeningHours } = await import("@/lib/drives/opening-hours");
    expect(describeDays([1, 2, 3, 4, 5])).toBe("Mon–Fri");
    expect(describeDays([7, 6])).toBe("Sat, Sun");
    expect(describeDays([1, 3, 4, 5, 7])).toBe("Mon, Wed–Fri, Sun");
    expect(describeOpeningHours([{ days: [1, 2, 3, 4, 5], opens: "09:00", closes: "17:00" }, { days: [6], opens: "10:00", closes: "12:00" }])).toBe(
      "Mon–Fri 09:00–17:00; Sat 10:00–12:00",
    );
    expect(describeOpeningHours([])).toBe("");
  });
  it("reads the form's hidden JSON field: empty is none, bad JSON or bad spans are refused", async () => {
    const { openingHoursField } = await import("@/lib/drives/opening-hours");
    expect(openingHoursField.parse("")).toEqual([]);
    expect(openingHoursField.parse('[{"days":[6,7],"opens":"09:00","closes":"13:00"}]')).toEqual([{ days: [6, 7], opens: "09:00", closes: "13:00" }]);
    expect(openingHoursField.safeParse("{not json").success).toBe(false);
    expect(openingHoursField.safeParse('[{"days":[],"opens":"09:00","closes":"13:00"}]').success).toBe(false);
  });
});
