import { z } from "zod";

/** Archiving or restoring takes no fields; anything sent is refused so a typo is not taken as a choice. */
export const recordArchiveInput = z.object({}).strict();

/** Deleting needs the confirmation sent along: a bare request deletes nothing (422). */
export const recordDeleteInput = z
  .object({ confirm: z.literal(true, { error: "Confirm the deletion: it cannot be undone." }) }, { error: "Confirm the deletion: it cannot be undone." })
  .strict();
export type RecordDeleteInput = z.infer<typeof recordDeleteInput>;

/** `?archived=1` on a list: only the archived records; without it (or 0), the active ones. */
export const shelfQuery = z
  .object({ archived: z.enum(["0", "1"], { error: "archived is 0 or 1" }).optional() })
  .transform((q) => (q.archived === "1" ? "archived" : "active") as "active" | "archived");
