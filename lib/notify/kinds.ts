// The kinds of e-mail a person is sent without asking (issue 16), each of which
// they can switch off. Pure; safe in the client.
export const NOTIFICATION_KINDS = ["runReminder", "weeklySummary", "unitReady"] as const;
export type NotificationKind = (typeof NOTIFICATION_KINDS)[number];

export const NOTIFICATION_TEXT: Record<NotificationKind, { label: string; hint: string }> = {
  runReminder: {
    label: "Pickup run reminders",
    hint: "The day before a run given to you: its stops, addresses, hours, access notes and hosts.",
  },
  weeklySummary: {
    label: "Weekly summary (organisers)",
    hint: "Each Monday: progress towards the target, full bins, pledges due and runs done.",
  },
  unitReady: {
    label: "Cans ready for my heater unit (builders)",
    hint: "Once per unit, when enough punched cans wait unclaimed to cover what it still needs.",
  },
};

/** The outbox's `kind` column for each: what the "Sent mail" page shows. */
export const NOTIFICATION_MAIL_KIND: Record<NotificationKind, string> = {
  runReminder: "run_reminder",
  weeklySummary: "weekly_summary",
  unitReady: "unit_ready",
};

export type NotificationSettings = Record<NotificationKind, boolean>;
