import { z } from "zod";
import { day } from "@/lib/dates";
import { FILL_LEVELS } from "./fill";
import { openingHoursField } from "./opening-hours";

export { FILL_LEVELS };

// One schema per input, shared by the forms (client) and the route handlers.

const isoDate = day("Use a date like 2026-11-01.", "That date does not exist.");

export const SLUG_PATTERN = /^[a-z0-9]+(?:-[a-z0-9]+)*$/;

export const driveInput = z
  .object({
    name: z.string().trim().min(3, "Give the drive a name of at least 3 letters.").max(120, "Keep the name under 120 characters."),
    slug: z
      .string()
      .trim()
      .min(3, "The web address needs at least 3 characters.")
      .max(80, "Keep the web address under 80 characters.")
      .regex(SLUG_PATTERN, "Use lower-case letters, digits and single dashes, like larkhollow-winter."),
    startsOn: isoDate,
    endsOn: isoDate,
    isPublic: z.boolean(),
    description: z.string().max(2000, "Keep the description under 2000 characters.").default(""),
    wanted: z.string().max(1000, "Keep this under 1000 characters.").default(""),
  })
  .refine((d) => d.endsOn >= d.startsOn, { path: ["endsOn"], message: "The end date must be on or after the start date." });
export type DriveInput = z.infer<typeof driveInput>;

// No defaults here: a partial update must leave unsent fields alone (the table has the defaults).
export const dropPointInput = z.object({
  name: z.string().trim().min(2, "Give the drop point a name.").max(120, "Keep the name under 120 characters."),
  address: z.string().trim().max(240, "Keep the address under 240 characters.").optional(),
  lat: z.number({ message: "Place the drop point on the map." }).min(-90, "Latitude must be between −90 and 90.").max(90, "Latitude must be between −90 and 90."),
  lng: z.number({ message: "Place the drop point on the map." }).min(-180, "Longitude must be between −180 and 180.").max(180, "Longitude must be between −180 and 180."),
  hours: z.string().trim().max(240, "Keep the hours under 240 characters.").optional(),
  /** Structured days and times (lib/drives/opening-hours.ts); the free-text `hours` stays for notes. */
  openingHours: openingHoursField.optional(),
  hostName: z.string().trim().max(120).optional(),
  hostPhone: z.string().trim().max(40, "Keep the phone number under 40 characters.").optional(),
  hostEmail: z.union([z.literal(""), z.string().trim().email("That e-mail address does not look right.")]).optional(),
  capacityBags: z.number({ message: "Say how many bags the bin holds." }).int("Use a whole number of bags.").min(1, "A bin holds at least 1 bag.").max(100, "Up to 100 bags."),
  active: z.boolean().optional(),
});
export type DropPointInput = z.infer<typeof dropPointInput>;
export const dropPointPatch = dropPointInput.partial();

export const pledgeInput = z.object({
  dropPointId: z.string().uuid("Choose a drop point."),
  name: z.string().trim().max(120, "Keep the name under 120 characters.").default(""),
  email: z.union([z.literal(""), z.string().trim().email("That e-mail address does not look right.")]).default(""),
  bags: z.number({ message: "About how many bags?" }).int("Use a whole number of bags.").min(1, "At least 1 bag.").max(50, "For more than 50 bags, write to the organisers."),
  bringOn: isoDate,
});
export type PledgeInput = z.infer<typeof pledgeInput>;

export const fillReportInput = z.object({
  level: z.number().int().refine((n) => (FILL_LEVELS as readonly number[]).includes(n), "Choose how full the bin is."),
  note: z.string().trim().max(500, "Keep the note under 500 characters.").default(""),
});
export type FillReportInput = z.infer<typeof fillReportInput>;

/** POST /api/drop-points/{id}/fill-clear: optionally the time of the report the organiser saw. */
export const fillClearInput = z.object({
  asOf: z.iso.datetime({ offset: true, error: "Use a date and time like 2026-12-02T09:30:00Z." }).optional(),
});
export type FillClearInput = z.infer<typeof fillClearInput>;

/** PUT /api/me/drive: the drive the person works on from now on, on every page where cans are entered. */
export const currentDriveInput = z.object({ driveId: z.uuid({ error: "Choose one of your group's drives." }) });
export type CurrentDriveInput = z.infer<typeof currentDriveInput>;

/** A pledge's states (issue 16): open, cancelled by the donor, or marked by the organiser. */
export const PLEDGE_STATUSES = ["pledged", "cancelled", "received", "notBrought"] as const;
export type PledgeStatus = (typeof PLEDGE_STATUSES)[number];
export const PLEDGE_STATUS_LABEL: Record<PledgeStatus, string> = {
  pledged: "Pledged",
  cancelled: "Cancelled by the donor",
  received: "Received",
  notBrought: "Not brought",
};

/** The donor's cancel link carries a 43-character base64url token. */
export const pledgeCancelInput = z.object({ token: z.string().regex(/^[A-Za-z0-9_-]{43}$/, "That cancel link is not complete; open it from the e-mail again.") });
export type PledgeCancelInput = z.infer<typeof pledgeCancelInput>;

/** POST /api/pledges/{id}/status: the organiser's mark; `haulId` only with `received`. */
export const pledgeMarkInput = z.object({
  status: z.enum(["pledged", "received", "notBrought"], { error: "Status is pledged, received or notBrought" }),
  haulId: z.string().uuid("Choose one of the drive's hauls.").optional(),
});
export type PledgeMarkInput = z.infer<typeof pledgeMarkInput>;
