import { NextResponse, after } from "next/server";
import { parseJson, route } from "@/lib/api/handler";
import { RESEND_ANSWER, resendVerificationInputSchema } from "@/lib/accounts/schemas";
import { resendVerification } from "@/lib/accounts/verification";

export const dynamic = "force-dynamic";

// The same answer, at the same speed, for every address: the lookup and the mail happen after the response.
export const POST = route(async (request) => {
  const { email } = await parseJson(request, resendVerificationInputSchema);
  after(() => resendVerification(email).catch((error) => console.error("[cantrove] verification mail failed", error)));
  return NextResponse.json({ message: RESEND_ANSWER }, { status: 202 });
});
