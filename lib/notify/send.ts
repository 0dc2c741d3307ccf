import "server-only";
import { db } from "@/lib/db";
import { deliver, queueMail } from "@/lib/mail/outbox";
import { NOTIFICATION_MAIL_KIND, type NotificationKind } from "./kinds";
import type { MailLinks } from "./mails";
import { unsubscribeHeaders, unsubscribeUrls } from "./unsubscribe";

export interface Recipient {
  userId: string;
  email: string;
}

export const linksFor = (userId: string, kind: NotificationKind): MailLinks => {
  const urls = unsubscribeUrls(userId, kind);
  return { unsubscribePage: urls.page, settings: urls.settings };
};

/**
 * Sends one notification at most once: the (kind, key) row in
 * notification_sends is claimed in the same transaction that writes the
 * e-mail to the outbox, so two servers sweeping at the same moment send it
 * once, and a crash before the commit leaves neither. True when this call sent it.
 */
export async function sendOnce(args: {
  kind: NotificationKind;
  key: string;
  groupId: string;
  to: Recipient;
  mail: { subject: string; text: string };
}): Promise<boolean> {
  const outboxId = await db.transaction(async (trx) => {
    const claimed = await trx("notification_sends")
      .insert({ kind: args.kind, key: args.key, group_id: args.groupId, user_id: args.to.userId })
      .onConflict(["kind", "key"])
      .ignore()
      .returning("key");
    if (!claimed.length) return null;
    const id = await queueMail(
      {
        groupId: args.groupId,
        to: args.to.email,
        ...args.mail,
        kind: NOTIFICATION_MAIL_KIND[args.kind],
        headers: unsubscribeHeaders(args.to.userId, args.kind),
      },
      trx,
    );
    await trx("notification_sends").where({ kind: args.kind, key: args.key }).update({ outbox_id: id });
    return id;
  });
  if (outboxId === null) return false;
  // A failed first attempt queues its own retry (lib/mail/outbox.ts); the claim stands either way.
  await deliver(outboxId);
  return true;
}
