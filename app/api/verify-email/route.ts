import { endpoint } from "@/lib/api/endpoint";
import { TOKEN_LIMITS } from "@/lib/accounts/limits";
import { verifyEmailInputSchema } from "@/lib/accounts/schemas";
import { proveEmail } from "@/lib/accounts/verification";

export const dynamic = "force-dynamic";

// Open to anyone holding the link: the token, mailed to the address, is the proof.
export const POST = endpoint(
  { who: "anyone", body: verifyEmailInputSchema, limits: TOKEN_LIMITS },
  async ({ body }) => {
    const email = await proveEmail(body.token);
    return { email, message: "Your e-mail address is confirmed. You can sign in now." };
  },
);
