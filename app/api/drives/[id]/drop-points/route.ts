import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { createDropPoint } from "@/lib/drives/commands";
import { listDropPoints } from "@/lib/drives/queries";
import { ownDrive } from "@/lib/drives/resource";
import { dropPointInput } from "@/lib/drives/schemas";
import { shelfQuery } from "@/lib/records/schemas";

export const dynamic = "force-dynamic";

const drive = { who: ["organiser"], params: idPath("That drive"), resource: ownDrive } as const;

// Includes the host's contact details, so organisers only. `?archived=1`: the archived ones only (issue 16).
export const GET = endpoint({ ...drive, query: shelfQuery }, async ({ actor, resource, query }) => listDropPoints(actor.group.id, resource.id, query));

export const POST = endpoint({ ...drive, body: dropPointInput, status: 201 }, async ({ actor, resource, body }) =>
  createDropPoint(actor.group.id, resource.id, body),
);
