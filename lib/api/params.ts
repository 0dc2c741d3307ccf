import { notFound } from "./errors";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A path id that is not a UUID cannot name a record: 404 rather than a database error. */
export function uuidParam(value: string | undefined, what: string): string {
  if (!value || !UUID.test(value)) throw notFound(what);
  return value;
}
