import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { resendInvitation } from "@/lib/accounts/invitations";
import { RESEND_INVITATION_LIMITS } from "@/lib/accounts/limits";

export const dynamic = "force-dynamic";

// resendInvitation updates the invitation by id *and* group: another group's is 404.
export const POST = endpoint(
  {
    who: ["organiser"],
    params: idPath("That invitation"),
    limits: RESEND_INVITATION_LIMITS,
  },
  async ({ actor, params }) => resendInvitation(actor, params.id),
);
