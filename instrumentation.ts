// Runs once when a server process starts: keeps queued e-mail moving while the
// mail service comes and goes.
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { retryDueMail } = await import("@/lib/mail/outbox");
  const timer = setInterval(() => {
    retryDueMail().catch(() => undefined);
  }, Number(process.env.MAIL_RETRY_MS ?? 15_000));
  timer.unref();
}
