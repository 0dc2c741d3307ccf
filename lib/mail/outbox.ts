import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import type { Knex } from "knex";
import { db } from "@/lib/db";
import { env } from "@/lib/env";
import { jobs, QUEUES } from "@/lib/jobs/queue";

export interface OutgoingMail {
  groupId: string | null;
  to: string;
  subject: string;
  text: string;
  html?: string;
  kind?: string;
  /** Extra headers, e.g. List-Unsubscribe and List-Unsubscribe-Post (RFC 8058). */
  headers?: Record<string, string>;
}

const MAX_ATTEMPTS = 8;
let transporter: Transporter | undefined;

function transport(): Transporter {
  transporter ??= nodemailer.createTransport({
    host: env().SMTP_HOST,
    port: env().SMTP_PORT,
    secure: false,
    ignoreTLS: true,
    connectionTimeout: 5_000,
  });
  return transporter;
}

/** After a failed attempt: 30 s, 1 min, 2 min… up to an hour, so a mail service outage is ridden out. */
export function retryDelaySeconds(attempts: number): number {
  return Math.min(3600, 30 * 2 ** (attempts - 1));
}

/** Puts the next try of one e-mail on the job queue; at most one waiting try per e-mail (the queue is "stately"). */
async function queueRetry(id: number, delaySeconds: number): Promise<void> {
  try {
    const boss = await jobs();
    await boss.send(QUEUES.mailDeliver, { outboxId: id }, { startAfter: delaySeconds, singletonKey: `outbox-${id}` });
  } catch (error) {
    // The database is away too: the row stays queued and the sweep puts it back on the queue later.
    console.warn("[cantrove] could not queue a mail retry:", (error as Error).message);
  }
}

/** One attempt at sending a queued e-mail; a failure records why and queues the next attempt. */
export async function deliver(id: number): Promise<boolean> {
  const row = await db("outbox").where({ id }).first();
  if (!row || row.status !== "queued") return row?.status === "sent";
  try {
    await transport().sendMail({
      from: env().MAIL_FROM,
      to: row.to_address,
      subject: row.subject,
      text: row.text_body,
      html: row.html_body ?? undefined,
      headers: { ...(row.headers ?? {}), "X-Cantrove-Group": row.group_id ?? "", "X-Cantrove-Kind": row.kind, "X-Cantrove-Outbox": String(id) },
    });
    await db("outbox").where({ id }).update({ status: "sent", sent_at: db.fn.now(), attempts: row.attempts + 1 });
    return true;
  } catch (error) {
    const attempts = row.attempts + 1;
    const failed = attempts >= MAX_ATTEMPTS;
    const delaySeconds = retryDelaySeconds(attempts);
    await db("outbox")
      .where({ id })
      .update({
        attempts,
        last_error: (error as Error).message.slice(0, 500),
        status: failed ? "failed" : "queued",
        next_attempt_at: db.raw(`now() + interval '${delaySeconds} seconds'`),
      });
    if (!failed) await queueRetry(id, delaySeconds);
    return false;
  }
}

/**
 * Writes a message to the outbox only, inside the caller's transaction (so a
 * claim and its e-mail commit together); the caller then calls deliver(id).
 */
export async function queueMail(mail: OutgoingMail, trx: Knex | Knex.Transaction = db): Promise<number> {
  const [row] = await trx("outbox")
    .insert({
      group_id: mail.groupId,
      to_address: mail.to,
      subject: mail.subject,
      text_body: mail.text,
      html_body: mail.html ?? null,
      kind: mail.kind ?? "notice",
      headers: mail.headers ?? null,
      // Keeps the sweep away while this first attempt runs.
      next_attempt_at: db.raw("now() + interval '60 seconds'"),
    })
    .returning("id");
  return row.id;
}

/** Queues a message and tries to send it at once; false means a retry is queued. */
export async function sendMail(mail: OutgoingMail): Promise<{ id: number; sent: boolean }> {
  const id = await queueMail(mail);
  return { id, sent: await deliver(id) };
}

/**
 * Queued e-mail whose next attempt is long overdue — its retry never reached
 * the job queue (a server stopped between the failure and the queueing, or the
 * database was away) — goes back on the queue. Run at start and on a schedule.
 */
export async function sweepMail(limit = 100): Promise<number> {
  const overdue = await db("outbox")
    .select("id")
    .where("status", "queued")
    .andWhere("next_attempt_at", "<=", db.raw("now() - interval '1 minute'"))
    .orderBy("id")
    .limit(limit);
  for (const { id } of overdue) await queueRetry(id, 0);
  return overdue.length;
}

export async function listOutbox(groupId: string, limit = 100) {
  return db("outbox")
    .select("id", "to_address as to", "subject", "kind", "status", "attempts", "last_error as lastError", "created_at as createdAt", "sent_at as sentAt")
    .where({ group_id: groupId })
    .orderBy("id", "desc")
    .limit(limit);
}
