import { NextResponse } from "next/server";
import { parseJson, route } from "@/lib/api/handler";
import { getSessionUserId } from "@/lib/auth/session";
import { acceptInvitationInputSchema } from "@/lib/accounts/schemas";
import { acceptInvitation } from "@/lib/accounts/invitations";

export const dynamic = "force-dynamic";

// Open to anyone holding the link: the token is the credential. Someone who
// already has an account must also be signed in as the invited address.
export const POST = route(async (request) => {
  const input = await parseJson(request, acceptInvitationInputSchema);
  const result = await acceptInvitation(input, await getSessionUserId());
  return NextResponse.json(
    { group: { id: result.groupId }, role: result.role, email: result.email, newAccount: result.newAccount },
    { status: 201 },
  );
});
