// How a group wants numbers, dates and measures shown: its time zone, its
// locale (date order, decimal and thousands marks) and its units. Plain data,
// safe in the client; pages read it on the server (group-look-queries.ts) and
// hand it to client components as a prop.

export type Units = "metric" | "imperial";

export interface Look {
  /** IANA name such as Europe/London: the group's day and clock. */
  timeZone: string;
  /** BCP 47 tag such as en-GB: how dates and numbers are written. */
  locale: string;
  units: Units;
}

export { DEFAULT_LOOK } from "./default-look";

/**
 * The locales offered. Cantrove's words are English, so only English locales:
 * a German date beside English words would read as a mistake.
 */
export const LOCALES: { code: string; label: string }[] = [
  { code: "en-GB", label: "English, United Kingdom" },
  { code: "en-IE", label: "English, Ireland" },
  { code: "en-US", label: "English, United States" },
  { code: "en-CA", label: "English, Canada" },
  { code: "en-AU", label: "English, Australia" },
  { code: "en-NZ", label: "English, New Zealand" },
  { code: "en-ZA", label: "English, South Africa" },
  { code: "en-IN", label: "English, India" },
];

export const UNITS_LABEL: Record<Units, string> = {
  metric: "Metric (mm, kg, km)",
  imperial: "Imperial (inches, pounds, miles)",
};

/** True for a time zone name Intl knows (UTC included, which Intl.supportedValuesOf leaves out). */
export function isTimeZone(name: string): boolean {
  try {
    new Intl.DateTimeFormat("en", { timeZone: name });
    return true;
  } catch {
    return false;
  }
}
