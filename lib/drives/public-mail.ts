import { createHash } from "node:crypto";
import { DEFAULT_LOOK, formatter, type Look } from "@/lib/format";
import { inertName, inertNote } from "@/lib/mail/inert-text";

// The e-mails anonymous visitors cause. Whatever they typed is quoted inert
// (lib/mail/inert-text.ts) and only below the first line; subjects carry only
// what organisers wrote.

export interface PledgeMailFacts {
  driveName: string;
  groupName: string;
  pointName: string;
  pointHours: string | null;
  bags: number;
  bringOn: string;
  donorName: string;
  driveUrl: string;
  /** The pledge's own cancel page (an unguessable token; the page asks before cancelling). */
  cancelUrl?: string;
  /** The drive's group's look, for the day and the count. */
  look?: Look;
}

export function pledgeConfirmation(f: PledgeMailFacts): { subject: string; text: string } {
  const name = inertName(f.donorName);
  const show = formatter(f.look ?? DEFAULT_LOOK);
  const lines = [
    `Thank you for your pledge to the ${f.driveName}.`,
    "",
    `You plan to bring about ${show.count(f.bags, "bag")} of cans to ${f.pointName} on ${show.longDay(f.bringOn)}.`,
    f.pointHours ? `Opening hours: ${f.pointHours}.` : null,
    name ? `Name given with the pledge: ${name}` : null,
    "",
    "Wanted: standard 355 mL aluminium drink cans, undented, not crushed, rinsed.",
    "Please keep back slim, tall and steel cans.",
    "",
    `The drive's page: ${f.driveUrl}`,
    f.cancelUrl ? `Plans changed? Cancel this pledge here (the page asks you to confirm): ${f.cancelUrl}` : null,
    "",
    `— ${f.groupName}`,
    "",
    "This address was given with a pledge on the drive's public page. If that was not you, you can ignore this",
    "message: an address gets at most one confirmation per drive a day.",
  ];
  return { subject: `Your pledge for the ${f.driveName}`, text: lines.filter((l) => l !== null).join("\n") };
}

export interface FillAlertFacts {
  pointName: string;
  levelLabel: string;
  note: string;
  driveUrl: string;
}

export function binFullAlert(f: FillAlertFacts): { subject: string; text: string } {
  const note = inertNote(f.note);
  const lines = [
    `Someone at ${f.pointName} reports the bin is: ${f.levelLabel}.`,
    note ? `Their note (as typed on the public page, links switched off): "${note}"` : "",
    "",
    "Plan a haul soon. You will not get another alert for this bin until it has been hauled.",
    f.driveUrl,
  ];
  return { subject: `Bin filling up: ${f.pointName}`, text: lines.filter(Boolean).join("\n") };
}

/**
 * The key under which one address gets one confirmation per drive a day: case
 * and a "+tag" in the local part do not make a new address (both reach the same inbox).
 */
export function confirmationAddressKey(email: string): string {
  const [local, domain = ""] = email.trim().toLowerCase().split(/@(?=[^@]*$)/);
  const base = local.replace(/\+.*$/, "");
  return createHash("sha256").update(`${base}@${domain}`).digest("hex");
}
