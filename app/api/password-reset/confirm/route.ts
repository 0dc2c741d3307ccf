import { endpoint } from "@/lib/api/endpoint";
import { TOKEN_LIMITS } from "@/lib/accounts/limits";
import { resetConfirmInputSchema } from "@/lib/accounts/schemas";
import { confirmPasswordReset } from "@/lib/accounts/resets";

export const dynamic = "force-dynamic";

export const POST = endpoint(
  { who: "anyone", body: resetConfirmInputSchema, limits: TOKEN_LIMITS },
  async ({ body }) => {
    await confirmPasswordReset(body.token, body.password);
    return { message: "Your password is changed. Sign in with the new one." };
  },
);
