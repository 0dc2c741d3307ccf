import { z } from "zod";
import { NOTIFICATION_KINDS } from "./kinds";

/** The settings page and PUT /api/me/notifications: each kind on (true) or off; a kind left out keeps its setting. */
export const notificationSettingsInput = z.object({
  runReminder: z.boolean().optional(),
  weeklySummary: z.boolean().optional(),
  unitReady: z.boolean().optional(),
});
export type NotificationSettingsInput = z.infer<typeof notificationSettingsInput>;

/** An unsubscribe token: a user id (32 hex), a kind, and the 43-character HMAC (lib/notify/unsubscribe.ts). */
export const unsubscribeTokenSchema = z
  .string()
  .regex(/^[0-9a-f]{32}\.[A-Za-z]{1,24}\.[A-Za-z0-9_-]{43}$/, "That unsubscribe link");
export const unsubscribePath = z.object({ token: unsubscribeTokenSchema });

export { NOTIFICATION_KINDS };
