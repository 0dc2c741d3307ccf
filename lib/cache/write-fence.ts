// The newest write this process knows of, as a WAL position (its own writes
// and every other server's, from their NOTIFY). A read may go to the replica
// only once the replica has replayed past it: so a write is visible on every
// server's next read, whichever database that read goes to.
const shared = globalThis as typeof globalThis & { __cantroveWriteFence?: { lsn: bigint } };
const fence = (shared.__cantroveWriteFence ??= { lsn: 0n });

/** "16/B374D848" → a number that orders like the WAL does; null for anything else. */
export function lsnValue(text: string | null | undefined): bigint | null {
  const m = /^([0-9A-Fa-f]{1,8})\/([0-9A-Fa-f]{1,8})$/.exec(text ?? "");
  return m ? (BigInt(`0x${m[1]}`) << 32n) + BigInt(`0x${m[2]}`) : null;
}

export function noteWriteLsn(text: string | null | undefined): void {
  const v = lsnValue(text);
  if (v !== null && v > fence.lsn) fence.lsn = v;
}

export function lastWriteLsn(): bigint {
  return fence.lsn;
}
