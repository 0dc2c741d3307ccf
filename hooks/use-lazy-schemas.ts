"use client";
import { useEffect, useState } from "react";

// zod is about 31 kB of compressed JavaScript: a page whose forms validate with it
// would send it before anything is drawn. Instead a form names the schemas it
// checks with as a loader (a dynamic import, its own chunk), fetches them once the
// page is up, and awaits them when it is sent. A form sent before they arrive
// waits for them; one sent with no connection uses the copy fetched on opening.
// If they never arrived (the connection dropped before), the send is refused
// with SCHEMAS_MISSING (schemasOr), which the form shows. The bundler keeps a
// chunk that failed to load as failed, so only reloading the page fetches it
// again (tests/e2e/lazy-schemas-offline.test.ts found a retry in place gets the same failure).
export type SchemaLoader<T> = () => Promise<T>;

/** What a form says when its checks could not be fetched. */
export const SCHEMAS_MISSING =
  "Nothing was sent: this form's checks did not load before the connection dropped. Once you are back online, reload the page and enter this again.";

/** Starts loading the schemas after the page is drawn and hands back the loader to await on submit (through schemasOr). */
export function useLazySchemas<T>(load: SchemaLoader<T>): SchemaLoader<T> {
  useEffect(() => {
    load().catch(() => undefined); // a failure is answered by the submit's own await (schemasOr)
  }, [load]);
  return load;
}

/** Awaits the schemas for a send; when they could not be fetched, says SCHEMAS_MISSING through `say` and gives null. */
export async function schemasOr<T>(load: SchemaLoader<T>, say: (message: string) => void): Promise<T | null> {
  try {
    return await load();
  } catch {
    say(SCHEMAS_MISSING);
    return null;
  }
}

/**
 * For a form that checks as the person types: the schemas once loaded (null
 * until then), and `failed` when they could not be fetched.
 */
export function useLoadedSchemas<T>(load: SchemaLoader<T>): { schemas: T | null; failed: boolean } {
  const [state, setState] = useState<{ schemas: T | null; failed: boolean }>({ schemas: null, failed: false });
  useEffect(() => {
    let live = true;
    load().then(
      (schemas) => live && setState({ schemas, failed: false }),
      () => live && setState({ schemas: null, failed: true }),
    );
    return () => {
      live = false;
    };
  }, [load]);
  return state;
}

export const ledgerSchemas = () => import("@/lib/ledger/schemas");
export const runSchemas = () => import("@/lib/runs/schemas");
export const planSchemas = () => import("@/lib/heaters/schemas");
