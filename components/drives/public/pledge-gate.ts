// Shared by the pledge slot (in the drive page's first bundle) and the pledge
// form (fetched later): a promise the slot resolves when the form's code is
// wanted. On the server it is resolved at once, so the form renders in full.
let open: () => void = () => undefined;

export const pledgeCodeWanted: Promise<void> =
  typeof window === "undefined"
    ? Promise.resolve()
    : new Promise<void>((resolve) => {
        open = resolve;
      });

export function wantPledgeCode(): void {
  open();
}

/** Set on the form element once React handles it; until then a submit is held back. */
export const LIVE = "live";
/** Set by the slot when someone submitted before the form's code arrived. */
export const WAITING = "submitWaiting";
