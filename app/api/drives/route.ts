import { endpoint } from "@/lib/api/endpoint";
import { createDrive } from "@/lib/drives/commands";
import { listDrives } from "@/lib/drives/queries";
import { driveInput } from "@/lib/drives/schemas";

export const dynamic = "force-dynamic";

export const GET = endpoint({ who: "member" }, async ({ actor }) => listDrives(actor.group.id));

export const POST = endpoint({ who: ["organiser"], body: driveInput, status: 201 }, async ({ actor, body }) => createDrive(actor.group.id, body));
