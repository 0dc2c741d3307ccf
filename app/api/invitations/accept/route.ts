import { getServerSession } from "next-auth";
import { endpoint } from "@/lib/api/endpoint";
import { authOptions } from "@/lib/auth/options";
import { acceptInvitationInputSchema } from "@/lib/accounts/schemas";
import { acceptInvitation } from "@/lib/accounts/invitations";
import { ACCOUNT_LIMITS } from "@/lib/accounts/limits";

export const dynamic = "force-dynamic";

// Open to anyone holding the link: the token is the credential. Someone who
// already has an account must also be signed in as the invited address.
export const POST = endpoint(
  { who: "anyone", body: acceptInvitationInputSchema, status: 201, limits: [{ rule: ACCOUNT_LIMITS.tokenPerClient, by: "client" }] },
  async ({ body }) => {
    const session = await getServerSession(authOptions);
    const result = await acceptInvitation(body, session?.userId || null);
    return { group: { id: result.groupId }, role: result.role, email: result.email, newAccount: result.newAccount };
  },
);
