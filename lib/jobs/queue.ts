import "server-only";
import PgBoss from "pg-boss";
import { env } from "@/lib/env";

// Background work on pg-boss, a job queue kept in PostgreSQL (schema `pgboss`,
// created and migrated by pg-boss itself on start): a job is a row, so it
// survives a restart, and any number of app servers can work one queue
// without sending anything twice. One instance per server process, kept on
// globalThis like the database (pages and route handlers are bundled apart).

export const QUEUES = {
  /** Send one queued e-mail again (data: { outboxId }). */
  mailDeliver: "mail-deliver",
  /** Now and then: any queued e-mail whose retry was never put on the queue (a server stopped in between). */
  mailSweep: "mail-sweep",
  /** Every 10 minutes: run reminders, weekly summaries and unit-ready notes that are due (lib/notify/sweep.ts). */
  notifySweep: "notify-sweep",
} as const;

const shared = globalThis as typeof globalThis & { cantroveJobs?: Promise<PgBoss> };

async function startQueue(): Promise<PgBoss> {
  const boss = new PgBoss({ connectionString: env().DATABASE_URL, max: 2, application_name: "cantrove-jobs" });
  boss.on("error", (error) => console.warn("[cantrove] job queue:", error.message));
  await boss.start();
  // "stately": at most one waiting and one running job per singletonKey, so a retry is never queued twice.
  await boss.createQueue(QUEUES.mailDeliver, { name: QUEUES.mailDeliver, policy: "stately" });
  await boss.createQueue(QUEUES.mailSweep, { name: QUEUES.mailSweep, policy: "singleton" });
  await boss.createQueue(QUEUES.notifySweep, { name: QUEUES.notifySweep, policy: "singleton" });
  return boss;
}

/** The process's queue, started on first use. A failed start is forgotten, so the next call tries again. */
export function jobs(): Promise<PgBoss> {
  shared.cantroveJobs ??= startQueue().catch((error) => {
    shared.cantroveJobs = undefined;
    throw error;
  });
  return shared.cantroveJobs;
}

/** Stops the queue (tests and scripts that start one). */
export async function stopJobs(): Promise<void> {
  const started = shared.cantroveJobs;
  shared.cantroveJobs = undefined;
  if (started) await (await started).stop({ graceful: true, wait: true });
}
