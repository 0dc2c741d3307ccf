import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { ownDrive } from "@/lib/drives/resource";
import { listArchivedOfDrive } from "@/lib/records/queries";

export const dynamic = "force-dynamic";

// The drive's archived drop points, pledges, fill reports and photos (issue 16): organisers only
// (drop points carry the hosts' contact details); another group's drive is 404.
export const GET = endpoint({ who: ["organiser"], params: idPath("That drive"), resource: ownDrive }, async ({ actor, resource }) =>
  listArchivedOfDrive(actor.group.id, resource.id),
);
