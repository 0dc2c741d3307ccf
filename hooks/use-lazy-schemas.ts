"use client";
import { useEffect, useState } from "react";

// zod is about 31 kB of compressed JavaScript, and building a form's schemas
// with it is a task of its own (150–400 ms on a phone-speed CPU for the ledger's):
// a page whose forms validate with it would send and run it before anything is
// drawn. Instead a form names the schemas it checks with as a loader (a dynamic
// import, its own chunk), starts fetching them at the person's first touch, key
// or focus on the page (so the phone's main thread is free while the page
// loads), and awaits them when it is sent. A form sent before they arrive waits
// for them. Once the offline worker has taken the page (right after the first
// signed-in visit) every chunk is precached and the checks load with no signal.
// Before that, if they never arrived (the connection dropped first), the send is
// refused with SCHEMAS_MISSING (schemasOr), which the form shows. The bundler
// keeps a chunk that failed to load as failed, so only reloading the page
// fetches it again (tests/e2e/lazy-schemas-offline.test.ts found a retry in
// place gets the same failure).
export type SchemaLoader<T> = () => Promise<T>;

/** What a form says when its checks could not be fetched. */
export const SCHEMAS_MISSING =
  "Nothing was sent: this form's checks did not load before the connection dropped. Once you are back online, reload the page and enter this again.";

const FIRST_USE = ["pointerdown", "keydown", "focusin"] as const;

/** Calls `start` once, at the first pointer press, key or focus anywhere on the page; gives back a way to stop waiting. */
function onFirstUse(start: () => void): () => void {
  let done = false;
  const stop = () => {
    for (const type of FIRST_USE) window.removeEventListener(type, go, true);
  };
  function go() {
    if (done) return;
    done = true;
    stop();
    start();
  }
  for (const type of FIRST_USE) window.addEventListener(type, go, { capture: true, passive: true });
  // A field already focused when the page was drawn (autofocus) is a first use too.
  if (document.activeElement && document.activeElement !== document.body) go();
  return stop;
}

/** Starts loading the schemas at the first use of the page and hands back the loader to await on submit (through schemasOr). */
export function useLazySchemas<T>(load: SchemaLoader<T>): SchemaLoader<T> {
  useEffect(
    () => onFirstUse(() => void load().catch(() => undefined)), // a failure is answered by the submit's own await (schemasOr)
    [load],
  );
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
    const stop = onFirstUse(() =>
      load().then(
        (schemas) => live && setState({ schemas, failed: false }),
        () => live && setState({ schemas: null, failed: true }),
      ),
    );
    return () => {
      live = false;
      stop();
    };
  }, [load]);
  return state;
}

export const ledgerSchemas = () => import("@/lib/ledger/schemas");
export const runSchemas = () => import("@/lib/runs/schemas");
export const planSchemas = () => import("@/lib/heaters/schemas");
