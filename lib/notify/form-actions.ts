"use server";

// The notification settings form, and the confirm button of an unsubscribe
// link. PUT /api/me/notifications and POST /api/unsubscribe/{token} are the
// JSON ways in, with the same schemas and functions.
import { z } from "zod";
import { action } from "@/lib/api/action";
import type { ActionState } from "@/lib/api/action-state";
import { notFound } from "@/lib/api/errors";
import { NOTIFICATION_KINDS, NOTIFICATION_TEXT, type NotificationKind, type NotificationSettings } from "./kinds";
import { UNSUBSCRIBE_LIMITS } from "./limits";
import { notificationSettingsInput, unsubscribePath } from "./schemas";
import { saveNotificationSettings, unsubscribe } from "./settings-queries";
import { readUnsubscribeToken } from "./unsubscribe";

// No resource: the settings are the actor's own, by their own id.
const saveRun = action({ who: "member", schema: notificationSettingsInput, checkboxes: NOTIFICATION_KINDS }, async ({ actor, input }) =>
  saveNotificationSettings(actor.user.id, input),
);

export async function saveNotificationsAction(previous: ActionState<NotificationSettings>, formData: FormData) {
  return saveRun(previous, formData);
}

// The token, a hidden field, is the credential: no session (the person may read mail on another device).
const unsubscribeRun = action(
  { who: "anyone", params: unsubscribePath, schema: z.object({}), limits: UNSUBSCRIBE_LIMITS, secret: ["token"] },
  async ({ params }) => {
    const link = readUnsubscribeToken(params.token);
    if (!link || !(await unsubscribe(link.userId, link.kind, "link"))) throw notFound("That unsubscribe link");
    return { kind: link.kind, label: NOTIFICATION_TEXT[link.kind].label };
  },
);

export async function unsubscribeAction(previous: ActionState<{ kind: NotificationKind; label: string }>, formData: FormData) {
  return unsubscribeRun(previous, formData);
}
