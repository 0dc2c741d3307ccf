import { after } from "next/server";
import { endpoint } from "@/lib/api/endpoint";
import { VERIFY_RESEND_LIMITS } from "@/lib/accounts/limits";
import { RESEND_ANSWER, resendVerificationInputSchema } from "@/lib/accounts/schemas";
import { resendVerification } from "@/lib/accounts/verification";

export const dynamic = "force-dynamic";

// The same answer, at the same speed, for every address: the lookup and the mail happen after the response.
// The mails per address are capped in resendVerification; this caps one client's asking.
export const POST = endpoint(
  { who: "anyone", body: resendVerificationInputSchema, status: 202, limits: VERIFY_RESEND_LIMITS },
  async ({ body }) => {
    after(() => resendVerification(body.email).catch((error) => console.error("[cantrove] verification mail failed", error)));
    return { message: RESEND_ANSWER };
  },
);
