"use client";
import { useEffect } from "react";

// zod is about 31 kB of compressed JavaScript: a page whose forms validate with it
// would send it before anything is drawn. Instead a form names the schemas it
// checks with as a loader (a dynamic import, its own chunk), fetches them once the
// page is up, and awaits them when it is sent. A form sent before they arrive
// waits for them; one sent with no connection uses the copy fetched on opening.
export type SchemaLoader<T> = () => Promise<T>;

/** Starts loading the schemas after the page is drawn and hands back the loader to await on submit. */
export function useLazySchemas<T>(load: SchemaLoader<T>): SchemaLoader<T> {
  useEffect(() => {
    load().catch(() => undefined); // a failed fetch is retried by the submit's own await
  }, [load]);
  return load;
}

export const ledgerSchemas = () => import("@/lib/ledger/schemas");
export const runSchemas = () => import("@/lib/runs/schemas");
