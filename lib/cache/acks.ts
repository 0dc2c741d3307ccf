// A write's wait for the other servers: each one, once it has cleared its cache
// for a message, answers with an acknowledgement naming the message
// (lib/cache/broadcast.ts). The writer waits until as many have answered as
// there were other servers listening when it sent, or until the time is up (a
// server that hangs must not hold every write; the cache's TTL is the net).
// On globalThis: the server loads this module once per route bundle, and the
// listener (one per process) must find the waiter a route's copy left here.

interface Waiter { left: number; done: () => void }
const shared = globalThis as typeof globalThis & { __cantroveAcks?: Map<string, Waiter> };
const waiters = (shared.__cantroveAcks ??= new Map<string, Waiter>());

/** Resolves once `count` acknowledgements of `id` came, or after `ms`. */
export function awaitAcks(id: string, count: number, ms: number): Promise<void> {
  if (count <= 0) return Promise.resolve();
  return new Promise<void>((resolve) => {
    const timer = setTimeout(finish, ms);
    function finish() {
      clearTimeout(timer);
      waiters.delete(id);
      resolve();
    }
    waiters.set(id, { left: count, done: finish });
  });
}

/** One server has cleared its cache for message `id`. */
export function ackReceived(id: string): void {
  const w = waiters.get(id);
  if (!w) return;
  w.left -= 1;
  if (w.left <= 0) w.done();
}

export function pendingAcks(): number {
  return waiters.size;
}
