// Sign-out on this phone: every cache and queued entry that holds the person's
// data goes before the session does (sign-out button, leaving a group, handing over).
import { entriesOf, forgetPersonEntries, isPersonalCache, setPerson, storedPersonId } from "./store";

/**
 * How many of the signed-in person's entries have not reached the server (asked about before
 * signing out): in all, and of those how many belong to `group` (the others show on Log only
 * in their own group, and are deleted with the rest).
 */
export async function unsentCount(group?: string | null): Promise<{ all: number; here: number }> {
  try {
    const id = await storedPersonId();
    if (!id) return { all: 0, here: 0 };
    const [all, here] = await Promise.all([entriesOf(id), group ? entriesOf(id, group) : entriesOf(id)]);
    return { all: all.length, here: here.length };
  } catch {
    return { all: 0, here: 0 };
  }
}

export async function forgetThisPhone(): Promise<void> {
  try {
    const id = await storedPersonId();
    if (id) await forgetPersonEntries(id);
    await setPerson(null);
  } catch {
    // no IndexedDB (private mode in some browsers): nothing was kept there
  }
  if (typeof caches !== "undefined") {
    for (const name of await caches.keys()) if (isPersonalCache(name)) await caches.delete(name);
  }
  // The worker drops what it holds in memory too, and forgets the person.
  const reg = "serviceWorker" in navigator ? await navigator.serviceWorker.getRegistration() : undefined;
  reg?.active?.postMessage({ type: "CANTROVE_SIGNED_OUT" });
  // The old localStorage queue (before IndexedDB) is personal too.
  try {
    localStorage.removeItem("cantrove.outbox.v1");
  } catch {
    // storage blocked
  }
}

/** Signs out after clearing this phone; with entries not yet sent, asks first. */
export async function signOutClearing(signOut: () => Promise<unknown>): Promise<void> {
  // Offline the sign-out request cannot reach the server: the session would stay on this phone
  // (the next person signed in as this one) while its entries were deleted.
  if (!navigator.onLine) {
    window.alert("You are offline. Connect to sign out, so that nobody else is signed in as you on this phone.");
    return;
  }
  const { all: unsent } = await unsentCount();
  if (unsent > 0 && !window.confirm(`${unsent === 1 ? "1 entry has" : `${unsent} entries have`} not been sent yet and will be deleted from this phone. Sign out anyway?`)) return;
  await forgetThisPhone();
  await signOut();
}
