import { endpoint } from "@/lib/api/endpoint";
import { SIGN_UP_LIMITS } from "@/lib/accounts/limits";
import { signUpInputSchema } from "@/lib/accounts/schemas";
import { signUp } from "@/lib/accounts/sign-up";

export const dynamic = "force-dynamic";

// Anyone may start a group; signing in waits until the link mailed to the address is opened.
// An address that already has an account gets this same answer (its owner gets a mail).
export const POST = endpoint(
  {
    who: "anyone",
    body: signUpInputSchema,
    status: 201,
    limits: SIGN_UP_LIMITS,
  },
  async ({ body }) => {
    const { groupId, slug } = await signUp(body);
    return { group: { id: groupId, slug, name: body.groupName }, role: "organiser" };
  },
);
