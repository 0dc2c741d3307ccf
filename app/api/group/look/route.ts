import { endpoint } from "@/lib/api/endpoint";
import { groupLook, saveGroupLook } from "@/lib/format/group-look-queries";
import { lookInput } from "@/lib/format/schemas";

export const dynamic = "force-dynamic";

// The acting group's look: time zone, locale and units (lib/format). No
// `resource`: both functions read and write only the actor's own group.
export const GET = endpoint({ who: "member" }, async ({ actor }) => groupLook(actor.group.id));

export const PUT = endpoint({ who: ["organiser"], body: lookInput }, async ({ actor, body }) => saveGroupLook(actor.group.id, body));
