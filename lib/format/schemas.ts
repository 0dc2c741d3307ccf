import { z } from "zod";
import { isTimeZone, LOCALES } from "./look";

// The group's look as the settings form and PUT /api/group/look send it.
const localeCodes = LOCALES.map((l) => l.code) as [string, ...string[]];

export const lookInput = z.object({
  timeZone: z
    .string({ error: "Choose a time zone." })
    .trim()
    .min(1, { error: "Choose a time zone." })
    .max(64, { error: "That time zone name is too long." })
    .refine(isTimeZone, { error: "Pick a time zone from the list, like Europe/London." }),
  locale: z.enum(localeCodes, { error: "Choose how dates and numbers are written from the list." }),
  units: z.enum(["metric", "imperial"], { error: "Choose metric or imperial." }),
});

export type LookInput = z.infer<typeof lookInput>;
