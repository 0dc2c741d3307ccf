import { endpoint } from "@/lib/api/endpoint";
import { createDrive } from "@/lib/drives/commands";
import { listDrives } from "@/lib/drives/queries";
import { driveInput } from "@/lib/drives/schemas";
import { shelfQuery } from "@/lib/records/schemas";

export const dynamic = "force-dynamic";

// Archived drives are left out; `?archived=1` lists only them (issue 16).
export const GET = endpoint({ who: "member", query: shelfQuery }, async ({ actor, query }) => listDrives(actor.group.id, query));

export const POST = endpoint({ who: ["organiser"], body: driveInput, status: 201 }, async ({ actor, body }) => createDrive(actor.group.id, body));
