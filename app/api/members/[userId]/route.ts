import { z } from "zod";
import { endpoint } from "@/lib/api/endpoint";
import { uuidSegment } from "@/lib/api/path";
import { memberRoleInputSchema } from "@/lib/accounts/schemas";
import { findMember, updateMembership } from "@/lib/accounts/queries";
import { groupMember } from "@/lib/accounts/resource";

export const dynamic = "force-dynamic";

const memberPath = z.object({ userId: uuidSegment("That member") });

// The member is resolved in the acting group first, so another group's
// member is a 404 whatever the body says.
export const PATCH = endpoint(
  { who: ["organiser"], params: memberPath, resource: groupMember, body: memberRoleInputSchema },
  async ({ actor, params, body }) => {
    await updateMembership(actor.group.id, params.userId, { role: body.role });
    return findMember(actor.group.id, params.userId);
  },
);

export const DELETE = endpoint({ who: ["organiser"], params: memberPath, resource: groupMember }, async ({ actor, params }) => {
  await updateMembership(actor.group.id, params.userId, { remove: true });
  return { removed: true };
});
