import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { updateDropPoint } from "@/lib/drives/commands";
import { ownDropPoint } from "@/lib/drives/resource";
import { dropPointPatch } from "@/lib/drives/schemas";

export const dynamic = "force-dynamic";

// Partial update: the map's drag sends only lat and lng, the form sends all fields.
export const PATCH = endpoint(
  { who: ["organiser"], params: idPath("That drop point"), resource: ownDropPoint, body: dropPointPatch },
  async ({ actor, resource, body }) => updateDropPoint(actor.group.id, resource.id, body),
);
