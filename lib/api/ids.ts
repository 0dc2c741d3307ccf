import { notFound } from "./errors";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** An id from the URL; anything that is not a uuid cannot name a record, so it is a 404. */
export function idParam(value: string, what = "That record"): string {
  if (!UUID.test(value)) throw notFound(what);
  return value;
}
