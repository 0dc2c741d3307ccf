import "server-only";
import { jobs, QUEUES } from "@/lib/jobs/queue";
import { runNotificationSweep } from "./sweep";

// Started by instrumentation.ts in each server process. pg-boss's schedule puts
// one sweep job on the queue every 10 minutes for the whole cluster, and the
// queue hands it to one server; the claims make even a second sweep harmless.
export const NOTIFY_CRON = "*/10 * * * *";

export async function startNotifyWork(): Promise<void> {
  const boss = await jobs();
  await boss.work(QUEUES.notifySweep, async () => {
    await runNotificationSweep(new Date());
  });
  await boss.schedule(QUEUES.notifySweep, NOTIFY_CRON);
}
