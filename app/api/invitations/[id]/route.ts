import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { revokeInvitation } from "@/lib/accounts/invitations";

export const dynamic = "force-dynamic";

// revokeInvitation updates by id *and* group: another group's is 404.
export const DELETE = endpoint({ who: ["organiser"], params: idPath("That invitation") }, async ({ actor, params }) => {
  await revokeInvitation(actor.group.id, params.id);
  return { revoked: true };
});
