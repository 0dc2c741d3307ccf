// The texts of the notification e-mails, in the group's look. Pure, so tests
// read them directly; the sweep (lib/notify/sweep.ts) fills them in.
import { formatter, type Look } from "@/lib/format";
import { describeOpeningHours, type OpeningHours } from "@/lib/drives/opening-hours";
import type { NotificationKind } from "./kinds";
import { NOTIFICATION_TEXT } from "./kinds";

export interface MailLinks {
  /** The confirm page of this kind's unsubscribe link. */
  unsubscribePage: string;
  /** The person's notification settings. */
  settings: string;
}

function footer(kind: NotificationKind, links: MailLinks): string[] {
  return [
    "",
    "--",
    `You get this because "${NOTIFICATION_TEXT[kind].label}" is on for you.`,
    `Stop these e-mails: ${links.unsubscribePage}`,
    `All your e-mail settings: ${links.settings}`,
  ];
}

export interface ReminderStop {
  name: string;
  address: string;
  hours: string;
  /** The structured days and times (lib/drives/opening-hours.ts); `hours` stays as the notes on them. */
  openingHours: OpeningHours | null;
  accessNotes: string;
  hostName: string | null;
  hostPhone: string | null;
  hostEmail: string | null;
}

export function runReminderMail(args: {
  look: Look;
  links: MailLinks;
  runUrl: string;
  volunteerName: string;
  driveName: string;
  plannedOn: string;
  notes: string;
  stops: ReminderStop[];
}) {
  const f = formatter(args.look);
  const subject = `Tomorrow: your pickup run, ${f.count(args.stops.length, "stop")} (${f.day(args.plannedOn)})`;
  const stopLines = args.stops.flatMap((s, i) => {
    const host = [s.hostName, s.hostPhone, s.hostEmail].filter(Boolean).join(", ");
    return [
      `${i + 1}. ${s.name}`,
      `   Address: ${s.address || "no address given"}`,
      `   Hours: ${[describeOpeningHours(s.openingHours), s.hours].filter(Boolean).join(" · ") || "not given"}`,
      ...(s.accessNotes ? [`   Access: ${s.accessNotes}`] : []),
      `   Host: ${host || "no contact given"}`,
    ];
  });
  const text = [
    `Hello ${args.volunteerName.split(" ")[0]},`,
    "",
    `Tomorrow, ${f.longDay(args.plannedOn)}, you have a pickup run for ${args.driveName}, in this order:`,
    "",
    ...stopLines,
    ...(args.notes ? ["", `Notes from the organiser: ${args.notes}`] : []),
    "",
    `Open the run on your phone: ${args.runUrl}`,
    "Wear gloves when handling bags: cans can have sharp edges, and sugary bins draw wasps.",
    ...footer("runReminder", args.links),
  ].join("\n");
  return { subject, text };
}

export interface SummaryDrive {
  name: string;
  goodCans: number;
  targetCans: number;
  remaining: number;
  fullBins: string[];
  pledgesDue: { dropPointName: string; bags: number; bringOn: string }[];
}

export function weeklySummaryMail(args: {
  look: Look;
  links: MailLinks;
  dashboardUrl: string;
  organiserName: string;
  groupName: string;
  weekOf: string;
  drives: SummaryDrive[];
  runsDone: { driveName: string; plannedOn: string; volunteerName: string | null; stops: number }[];
}) {
  const f = formatter(args.look);
  const subject = `${args.groupName}: your week from ${f.day(args.weekOf)}`;
  const driveLines = args.drives.flatMap((d) => {
    const good = f.count(d.goodCans, "good can");
    const progress =
      d.targetCans <= 0
        ? `${good}; no heater units planned yet, so no target`
        : d.remaining <= 0
          ? `${good} of ${f.number(d.targetCans)}: target reached`
          : `${good} of ${f.number(d.targetCans)} (${f.percent(d.goodCans / d.targetCans)}); ${f.number(d.remaining)} still to come`;
    const pledges = d.pledgesDue.map((p) => `     ${f.day(p.bringOn)}: ${f.count(p.bags, "bag")} at ${p.dropPointName}`);
    return [
      `${d.name}`,
      `   Progress: ${progress}`,
      `   Full bins: ${d.fullBins.length ? d.fullBins.join(", ") : "none"}`,
      `   Pledges due in the next 7 days: ${d.pledgesDue.length ? "" : "none"}`.trimEnd(),
      ...pledges,
      "",
    ];
  });
  const runLines = args.runsDone.length
    ? args.runsDone.map((r) => `   ${f.day(r.plannedOn)}, ${r.driveName}: ${f.count(r.stops, "stop")}${r.volunteerName ? `, ${r.volunteerName}` : ""}`)
    : ["   none"];
  const text = [
    `Hello ${args.organiserName.split(" ")[0]},`,
    "",
    `How ${args.groupName} stands this week:`,
    "",
    ...(driveLines.length ? driveLines : ["No drive is running.", ""]),
    "Pickup runs done in the last 7 days:",
    ...runLines,
    "",
    `The dashboard: ${args.dashboardUrl}`,
    ...footer("weeklySummary", args.links),
  ].join("\n");
  return { subject, text };
}

export function unitReadyMail(args: {
  look: Look;
  links: MailLinks;
  unitUrl: string;
  builderName: string;
  unitName: string;
  driveName: string;
  remaining: number;
  readyPunched: number;
}) {
  const f = formatter(args.look);
  const subject = `Cans ready to claim for ${args.unitName}`;
  const text = [
    `Hello ${args.builderName.split(" ")[0]},`,
    "",
    `${args.driveName} now has ${f.count(args.readyPunched, "punched can")} waiting unclaimed, enough for the ${f.number(args.remaining)} that ${args.unitName} still needs.`,
    "Others may claim them too, so claim yours soon:",
    args.unitUrl,
    "",
    "Punched cans have sharp edges: wear gloves, and eye protection when you work on them.",
    ...footer("unitReady", args.links),
  ].join("\n");
  return { subject, text };
}
