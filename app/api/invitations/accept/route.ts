import { endpoint } from "@/lib/api/endpoint";
import { getSessionUserId } from "@/lib/auth/session";
import { acceptInvitationInputSchema } from "@/lib/accounts/schemas";
import { acceptInvitation } from "@/lib/accounts/invitations";
import { TOKEN_LIMITS } from "@/lib/accounts/limits";

export const dynamic = "force-dynamic";

// Open to anyone holding the link: the token is the credential. Someone who
// already has an account must also be signed in as the invited address.
export const POST = endpoint(
  { who: "anyone", body: acceptInvitationInputSchema, status: 201, limits: TOKEN_LIMITS },
  async ({ body }) => {
    const result = await acceptInvitation(body, await getSessionUserId());
    return { group: { id: result.groupId }, role: result.role, email: result.email, newAccount: result.newAccount };
  },
);
