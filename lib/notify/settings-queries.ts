import "server-only";
import type { Knex } from "knex";
import { db } from "@/lib/db";
import { NOTIFICATION_KINDS, type NotificationKind, type NotificationSettings } from "./kinds";
import type { NotificationSettingsInput } from "./schemas";

// A person's switches apply to every group they belong to: one row per kind
// switched off (notification_optouts), none for a kind that is on.

export async function notificationSettings(userId: string, trx: Knex = db): Promise<NotificationSettings> {
  const off = new Set(await trx("notification_optouts").where({ user_id: userId }).pluck("kind"));
  return Object.fromEntries(NOTIFICATION_KINDS.map((k) => [k, !off.has(k)])) as NotificationSettings;
}

export async function saveNotificationSettings(userId: string, input: NotificationSettingsInput, via: "settings" | "oneClick" | "link" = "settings"): Promise<NotificationSettings> {
  return db.transaction(async (trx) => {
    for (const kind of NOTIFICATION_KINDS) {
      const on = input[kind];
      if (on === undefined) continue;
      if (on) await trx("notification_optouts").where({ user_id: userId, kind }).delete();
      else await trx("notification_optouts").insert({ user_id: userId, kind, via }).onConflict(["user_id", "kind"]).ignore();
    }
    return notificationSettings(userId, trx);
  });
}

/** What an unsubscribe link does: that one kind off for that person. False when the person is gone. */
export async function unsubscribe(userId: string, kind: NotificationKind, via: "oneClick" | "link"): Promise<boolean> {
  const user = await db("users").select("id").where({ id: userId }).first();
  if (!user) return false;
  await saveNotificationSettings(userId, { [kind]: false }, via);
  return true;
}
