import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { updateDrive } from "@/lib/drives/commands";
import { ownDrive } from "@/lib/drives/resource";
import { driveInput } from "@/lib/drives/schemas";

export const dynamic = "force-dynamic";

export const GET = endpoint({ who: "member", params: idPath("That drive"), resource: ownDrive }, async ({ resource }) => resource);

export const PUT = endpoint(
  { who: ["organiser"], params: idPath("That drive"), resource: ownDrive, body: driveInput },
  async ({ actor, resource, body }) => updateDrive(actor.group.id, resource.id, body),
);
