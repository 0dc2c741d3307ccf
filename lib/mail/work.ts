import "server-only";
import { jobs, QUEUES } from "@/lib/jobs/queue";
import { deliver, sweepMail } from "./outbox";

// The mail side of the job queue, started by instrumentation.ts in each server
// process: any process may take any retry; the queue hands each to one.
const POLL_SECONDS = Math.max(0.5, Number(process.env.MAIL_POLL_SECONDS ?? 2));

export async function startMailWork(): Promise<void> {
  const boss = await jobs();
  await boss.work<{ outboxId: number }>(QUEUES.mailDeliver, { pollingIntervalSeconds: POLL_SECONDS }, async (batch) => {
    for (const job of batch) await deliver(Number(job.data.outboxId));
  });
  await boss.work(QUEUES.mailSweep, async () => {
    await sweepMail();
  });
  await boss.schedule(QUEUES.mailSweep, "*/5 * * * *");
  await sweepMail();
}
