// Runs once when a server process starts: the job queue's workers (queued
// e-mail keeps moving while the mail service comes and goes; notifications
// are swept on a schedule). If the database is not there yet, each tries
// again until it is.
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  // Other servers' writes clear this one's short read cache (lib/cache/broadcast.ts).
  const { startReadCacheListener } = await import("@/lib/cache/broadcast");
  startReadCacheListener();
  const { startMailWork } = await import("@/lib/mail/work");
  const { startNotifyWork } = await import("@/lib/notify/work");
  const keepTrying = (what: string, work: () => Promise<void>) => {
    const start = () =>
      work().catch((error: Error) => {
        console.warn(`[cantrove] ${what} not started yet:`, error.message);
        setTimeout(start, 15_000).unref();
      });
    void start();
  };
  keepTrying("background mail work", startMailWork);
  keepTrying("notification sweep", startNotifyWork);
}
