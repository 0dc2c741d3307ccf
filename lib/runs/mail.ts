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
