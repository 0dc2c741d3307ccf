// Runs once when a server process starts: the job queue's workers (queued
// e-mail keeps moving while the mail service comes and goes). If the database
// is not there yet, it tries again until it is.
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  // Other servers' writes clear this one's short read cache (lib/cache/broadcast.ts).
  const { startReadCacheListener } = await import("@/lib/cache/broadcast");
  startReadCacheListener();
  const { startMailWork } = await import("@/lib/mail/work");
  const start = () =>
    startMailWork().catch((error: Error) => {
      console.warn("[cantrove] background work not started yet:", error.message);
      setTimeout(start, 15_000).unref();
    });
  void start();
}
