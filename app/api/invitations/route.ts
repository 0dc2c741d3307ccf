import { endpoint } from "@/lib/api/endpoint";
import { invitationInputSchema } from "@/lib/accounts/schemas";
import { createInvitation, listPendingInvitations } from "@/lib/accounts/invitations";
import { INVITE_LIMITS } from "@/lib/accounts/limits";

export const dynamic = "force-dynamic";

export const GET = endpoint({ who: ["organiser"] }, async ({ actor }) => listPendingInvitations(actor.group.id));

export const POST = endpoint(
  {
    who: ["organiser"],
    body: invitationInputSchema,
    status: 201,
    limits: INVITE_LIMITS,
  },
  async ({ actor, body }) => createInvitation(actor, body),
);
