import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { markPledge, ownPledge } from "@/lib/drives/pledge-life";
import { pledgeMarkInput } from "@/lib/drives/schemas";

export const dynamic = "force-dynamic";

// The organiser marks a pledge received (optionally with the haul that brought
// it) or not brought. Another group's pledge is 404; a cancelled one 409.
export const POST = endpoint({ who: ["organiser"], params: idPath("That pledge"), resource: ownPledge, body: pledgeMarkInput }, async ({ actor, params, body }) =>
  markPledge(actor, params.id, body.status, body.haulId),
);
