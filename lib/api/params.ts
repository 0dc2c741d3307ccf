import { notFound } from "./errors";

export type IdContext = { params: Promise<{ id: string }> };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** The route's `[id]`; anything that is not a UUID cannot name a record, so it is 404. */
export async function uuidParam(ctx: IdContext, what = "That record"): Promise<string> {
  const { id } = await ctx.params;
  if (!UUID.test(id)) throw notFound(what);
  return id.toLowerCase();
}

/** The same check for any other path or query value (a second `[stopId]`, `?driveId=`). */
export function uuidValue(value: string | null | undefined, what = "That record"): string {
  if (!value || !UUID.test(value)) throw notFound(what);
  return value.toLowerCase();
}
