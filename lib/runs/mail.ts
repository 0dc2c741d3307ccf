import { DEFAULT_LOOK, formatter, type Look } from "@/lib/format";

/** The e-mail a volunteer gets when a run is given to them, in the group's look. Pure, so it is easy to read in tests. */
export function runAssignedMail(args: {
  appUrl: string;
  runId: string;
  assigneeName: string;
  organiserName: string;
  driveName: string;
  plannedOn: string;
  distanceKm: number;
  stopNames: string[];
  look?: Look;
}) {
  const f = formatter(args.look ?? DEFAULT_LOOK);
  const day = f.longDay(args.plannedOn);
  const link = `${args.appUrl.replace(/\/$/, "")}/runs/${args.runId}`;
  const first = args.assigneeName.split(" ")[0];
  const lines = args.stopNames.map((name, i) => `  ${i + 1}. ${name}`);
  const subject = `Pickup run on ${f.day(args.plannedOn)}: ${f.count(args.stopNames.length, "stop")}`;
  const text = [
    `Hello ${first},`,
    "",
    `${args.organiserName} has given you a pickup run for ${args.driveName} on ${day}.`,
    `About ${f.distance(args.distanceKm)} in a straight line between stops, in this order:`,
    ...lines,
    "",
    `Open the run on your phone: ${link}`,
    "Log each haul at its stop, or skip a stop with a reason if you cannot get to it.",
    "",
    "Wear gloves when handling bags: cans can have sharp edges, and sugary bins draw wasps.",
  ].join("\n");
  return { subject, text };
}

/** The e-mail a volunteer gets when an organiser takes a run off them (given to someone else). */
export function runTakenOffMail(args: { appUrl: string; runId: string; name: string; organiserName: string; driveName: string; plannedOn: string; look?: Look }) {
  const f = formatter(args.look ?? DEFAULT_LOOK);
  const first = args.name.split(" ")[0];
  const subject = `Pickup run on ${f.day(args.plannedOn)} given to someone else`;
  const text = [
    `Hello ${first},`,
    "",
    `${args.organiserName} has given your pickup run for ${args.driveName} on ${f.longDay(args.plannedOn)} to someone else.`,
    "You do not need to do this run. Thank you for keeping the day free.",
    "",
    `Your other runs: ${args.appUrl.replace(/\/$/, "")}/runs`,
  ].join("\n");
  return { subject, text };
}

/** The e-mail the run's volunteer gets when its day moves. */
export function runMovedMail(args: { appUrl: string; runId: string; name: string; organiserName: string; driveName: string; from: string; to: string; look?: Look }) {
  const f = formatter(args.look ?? DEFAULT_LOOK);
  const first = args.name.split(" ")[0];
  const subject = `Pickup run moved to ${f.day(args.to)}`;
  const text = [
    `Hello ${first},`,
    "",
    `${args.organiserName} has moved your pickup run for ${args.driveName} from ${f.longDay(args.from)} to ${f.longDay(args.to)}.`,
    `Open the run: ${args.appUrl.replace(/\/$/, "")}/runs/${args.runId}`,
  ].join("\n");
  return { subject, text };
}

/** The e-mail the run's volunteer gets when the run is cancelled. */
export function runCancelledMail(args: { appUrl: string; runId: string; name: string; organiserName: string; driveName: string; plannedOn: string; reason: string; look?: Look }) {
  const f = formatter(args.look ?? DEFAULT_LOOK);
  const first = args.name.split(" ")[0];
  const subject = `Pickup run on ${f.day(args.plannedOn)} cancelled`;
  const text = [
    `Hello ${first},`,
    "",
    `${args.organiserName} has cancelled the pickup run for ${args.driveName} on ${f.longDay(args.plannedOn)}.`,
    `Reason: ${args.reason}`,
    "Hauls already logged on it stay in the records.",
    `The run: ${args.appUrl.replace(/\/$/, "")}/runs/${args.runId}`,
  ].join("\n");
  return { subject, text };
}
