import { NextResponse, after } from "next/server";
import { parseJson, route } from "@/lib/api/handler";
import { RESET_ANSWER, resetRequestInputSchema } from "@/lib/accounts/schemas";
import { requestPasswordReset } from "@/lib/accounts/resets";

export const dynamic = "force-dynamic";

// The same answer, at the same speed, whether or not the address has an
// account: the lookup and the e-mail happen after the response has gone.
export const POST = route(async (request) => {
  const { email } = await parseJson(request, resetRequestInputSchema);
  after(() => requestPasswordReset(email).catch((error) => console.error("[cantrove] reset mail failed", error)));
  return NextResponse.json({ message: RESET_ANSWER }, { status: 202 });
});
