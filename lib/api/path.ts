import { z } from "zod";

// Path schemas for endpoint(): a value that cannot name a record is a 404
// whose message is the label given here ("That drive was not found.").
export const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export const uuidSegment = (what: string) =>
  z.string().regex(UUID, { message: what }).transform((id) => id.toLowerCase());

export const slugSegment = (what: string) => z.string().min(1, { message: what }).max(200, { message: what });

/** `[id]` routes. */
export const idPath = (what: string) => z.object({ id: uuidSegment(what) });
export const slugPath = (what = "That drive") => z.object({ slug: slugSegment(what) });
