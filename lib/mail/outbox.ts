import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { db } from "@/lib/db";
import { env } from "@/lib/env";

export interface OutgoingMail {
  groupId: string | null;
  to: string;
  subject: string;
  text: string;
  html?: string;
  kind?: string;
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

async function deliver(id: number): Promise<boolean> {
  const row = await db("outbox").where({ id }).first();
  if (!row || row.status !== "queued") return row?.status === "sent";
  try {
    await transport().sendMail({
      from: env().MAIL_FROM,
      to: row.to_address,
      subject: row.subject,
      text: row.text_body,
      html: row.html_body ?? undefined,
      headers: { "X-Cantrove-Group": row.group_id ?? "", "X-Cantrove-Kind": row.kind, "X-Cantrove-Outbox": String(id) },
    });
    await db("outbox").where({ id }).update({ status: "sent", sent_at: db.fn.now(), attempts: row.attempts + 1 });
    return true;
  } catch (error) {
    const attempts = row.attempts + 1;
    // Back off 30 s, 1 min, 2 min… so a mail service outage is ridden out.
    const delaySeconds = Math.min(3600, 30 * 2 ** (attempts - 1));
    await db("outbox")
      .where({ id })
      .update({
        attempts,
        last_error: (error as Error).message.slice(0, 500),
        status: attempts >= MAX_ATTEMPTS ? "failed" : "queued",
        next_attempt_at: db.raw(`now() + interval '${delaySeconds} seconds'`),
      });
    return false;
  }
}

/** Queues a message and tries to send it at once; false means it is queued for a retry. */
export async function sendMail(mail: OutgoingMail): Promise<{ id: number; sent: boolean }> {
  const [row] = await db("outbox")
    .insert({
      group_id: mail.groupId,
      to_address: mail.to,
      subject: mail.subject,
      text_body: mail.text,
      html_body: mail.html ?? null,
      kind: mail.kind ?? "notice",
      // Keeps the retry timer away while this first attempt runs.
      next_attempt_at: db.raw("now() + interval '60 seconds'"),
    })
    .returning("id");
  const id = Number(row.id);
  return { id, sent: await deliver(id) };
}

/** Sends what is due; called on a timer by instrumentation.ts. */
export async function retryDueMail(limit = 20): Promise<number> {
  // Claim the due rows first so two app servers never send the same message.
  const due: { id: string }[] = await db("outbox")
    .update({ next_attempt_at: db.raw("now() + interval '120 seconds'") })
    .whereIn(
      "id",
      db("outbox")
        .select("id")
        .where("status", "queued")
        .andWhere("next_attempt_at", "<=", db.fn.now())
        .orderBy("id")
        .limit(limit)
        .forUpdate()
        .skipLocked(),
    )
    .returning("id");
  let sent = 0;
  for (const { id } of due) if (await deliver(Number(id))) sent += 1;
  return sent;
}

export async function listOutbox(groupId: string, limit = 100) {
  return db("outbox")
    .select("id", "to_address as to", "subject", "kind", "status", "attempts", "last_error as lastError", "created_at as createdAt", "sent_at as sentAt")
    .where({ group_id: groupId })
    .orderBy("id", "desc")
    .limit(limit);
}
