// What this phone keeps for the signed-in person while there is no signal, in
// IndexedDB (through `idb`), shared by the pages and the service worker
// (app/sw.ts): who is signed in here, and the entries waiting to be sent.
// Every entry carries its owner's user id: it is only ever sent, shown or
// dropped for that person (and the server refuses it under anyone else,
// lib/api/endpoint.ts, X-Cantrove-Entered-By).

import { openDB, type DBSchema, type IDBPDatabase } from "idb";
import type { OutboxItem } from "@/lib/ledger/browser-queue";

export interface Person {
  id: string;
  /** The group they act in: what is kept for them is kept for this person in this group only. */
  group: string;
  /** The person's landing page (ROLE_HOME), where /home leads when there is no signal. */
  home: string;
}

/** A queued entry: waiting to be sent, or refused by the server (kept until fixed or dropped). */
export interface QueuedEntry extends OutboxItem {
  owner: string;
  /** The group it was entered in (absent on entries from before groups were kept): it is shown and sent only while the person acts in that group. */
  group?: string;
  /** Order of entry: entries are sent oldest first. */
  seq: number;
  state: "waiting" | "refused";
  refusal?: { status: number; message: string; question?: string; fields?: Record<string, string> };
  /** Where the entry was made (a run's stop shows its own waiting entry). */
  stopId?: string;
}

interface OfflineDB extends DBSchema {
  meta: { key: string; value: Person | number | string[] };
  outbox: { key: string; value: QueuedEntry; indexes: { seq: number } };
}

export const DB_NAME = "cantrove-offline";
/**
 * Every cache of one person's pages, answers and map tiles starts with this and ends with
 * `<user id>.<group id>`: a person who switches group gets other caches, and the old ones go.
 */
export const PERSON_CACHE_PREFIX = "cantrove-person-";
export const TILE_CACHE_PREFIX = "cantrove-tiles-";
export const personKey = (p: Pick<Person, "id" | "group">) => `${p.id}.${p.group}`;
export const samePerson = (a: Pick<Person, "id" | "group"> | null | undefined, b: Pick<Person, "id" | "group"> | null | undefined) => !!a && !!b && a.id === b.id && a.group === b.group;
export const personCache = (p: Pick<Person, "id" | "group">) => `${PERSON_CACHE_PREFIX}${personKey(p)}`;
export const tileCache = (p: Pick<Person, "id" | "group">) => `${TILE_CACHE_PREFIX}${personKey(p)}`;
export const isPersonalCache = (name: string) => name.startsWith(PERSON_CACHE_PREFIX) || name.startsWith(TILE_CACHE_PREFIX);

let opened: Promise<IDBPDatabase<OfflineDB>> | null = null;
function db(): Promise<IDBPDatabase<OfflineDB>> {
  opened ??= openDB<OfflineDB>(DB_NAME, 1, {
    upgrade(d) {
      d.createObjectStore("meta");
      d.createObjectStore("outbox", { keyPath: "key" }).createIndex("seq", "seq");
    },
  });
  return opened;
}

export async function currentPerson(): Promise<Person | null> {
  const p = await (await db()).get("meta", "person");
  // A person kept by an older version carries no group: not a person this version can file anything under.
  return p && typeof p === "object" && !Array.isArray(p) && typeof p.group === "string" ? p : null;
}

/** The id of whoever this phone remembers, also one kept by an older version (no group): what sign-out forgets. */
export async function storedPersonId(): Promise<string | null> {
  const p = await (await db()).get("meta", "person");
  return p && typeof p === "object" && !Array.isArray(p) && typeof p.id === "string" ? p.id : null;
}

export async function setPerson(person: Person | null): Promise<void> {
  const d = await db();
  if (person) await d.put("meta", person, "person");
  else await d.delete("meta", "person");
}

/**
 * All of one person's entries (waiting and refused), oldest first; with `group`, only those made in
 * that group: after a switch, the other group's entries wait (unseen) until the person is back in it.
 */
export async function entriesOf(owner: string, group?: string): Promise<QueuedEntry[]> {
  const all = await (await db()).getAllFromIndex("outbox", "seq");
  return all.filter((e) => e.owner === owner && (group === undefined || e.group === undefined || e.group === group));
}

export async function putEntry(entry: Omit<QueuedEntry, "seq"> & { seq?: number }): Promise<QueuedEntry> {
  const d = await db();
  const tx = d.transaction("outbox", "readwrite");
  const old = await tx.store.get(entry.key);
  let seq = entry.seq ?? old?.seq;
  if (seq === undefined) {
    const last = await tx.store.index("seq").openCursor(null, "prev");
    seq = (last?.value.seq ?? 0) + 1;
  }
  const saved: QueuedEntry = { ...entry, seq };
  await tx.store.put(saved);
  await tx.done;
  return saved;
}

export async function getEntry(key: string): Promise<QueuedEntry | undefined> {
  return (await db()).get("outbox", key);
}

export async function deleteEntry(key: string): Promise<void> {
  await (await db()).delete("outbox", key);
}

/** Sign-out: this person's entries go, with everything else this phone kept for them. */
export async function forgetPersonEntries(owner: string): Promise<void> {
  const d = await db();
  const tx = d.transaction("outbox", "readwrite");
  for (const e of await tx.store.getAll()) if (e.owner === owner) await tx.store.delete(e.key);
  await tx.done;
}

export async function lastWarmed(): Promise<number> {
  const v = await (await db()).get("meta", "warmedAt");
  return typeof v === "number" ? v : 0;
}

export async function setLastWarmed(at: number): Promise<void> {
  await (await db()).put("meta", at, "warmedAt");
}

/** The map tiles the last warm-up chose for the person's runs (kept first when the tile cache is over budget). */
export async function wantedTiles(): Promise<string[]> {
  const v = await (await db()).get("meta", "wantedTiles");
  return Array.isArray(v) ? v : [];
}

export async function setWantedTiles(urls: string[]): Promise<void> {
  await (await db()).put("meta", urls, "wantedTiles");
}
