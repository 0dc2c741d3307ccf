import { NextResponse } from "next/server";
import { parseJson, route } from "@/lib/api/handler";
import { verifyEmailInputSchema } from "@/lib/accounts/schemas";
import { proveEmail } from "@/lib/accounts/verification";

export const dynamic = "force-dynamic";

// Open to anyone holding the link: the token, mailed to the address, is the proof.
export const POST = route(async (request) => {
  const { token } = await parseJson(request, verifyEmailInputSchema);
  const email = await proveEmail(token);
  return NextResponse.json({ email, message: "Your e-mail address is confirmed. You can sign in now." });
});
