import "server-only";
import { jobs, QUEUES } from "@/lib/jobs/queue";
import { runNotificationSweep } from "./sweep";

// Started by instrumentation.ts in each server process. pg-boss's schedule puts
// one sweep job on the queue every 10 minutes for the whole cluster, and the
// queue hands it to one server; the claims make even a second sweep harmless.
// NOTIFY_SCHEDULE is a cron line, or "off" (the test stack: its tests run the
// sweep at the moments they choose, and no mail arrives at moments they did not).
export const NOTIFY_CRON = "*/10 * * * *";

export async function startNotifyWork(): Promise<void> {
  const boss = await jobs();
  await boss.work(QUEUES.notifySweep, async () => {
    await runNotificationSweep(new Date());
  });
  const cron = process.env.NOTIFY_SCHEDULE?.trim() || NOTIFY_CRON;
  if (cron === "off") await boss.unschedule(QUEUES.notifySweep);
  else await boss.schedule(QUEUES.notifySweep, cron);
}
