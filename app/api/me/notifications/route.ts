import { endpoint } from "@/lib/api/endpoint";
import { notificationSettings, saveNotificationSettings } from "@/lib/notify/settings-queries";
import { notificationSettingsInput } from "@/lib/notify/schemas";

export const dynamic = "force-dynamic";

// The person's own switches: no resource, the queries take only the actor's own id.
export const GET = endpoint({ who: "member" }, async ({ actor }) => notificationSettings(actor.user.id));

export const PUT = endpoint({ who: "member", body: notificationSettingsInput }, async ({ actor, body }) => saveNotificationSettings(actor.user.id, body));
