import { NextResponse } from "next/server";
import { parseJson, route } from "@/lib/api/handler";
import { resetConfirmInputSchema } from "@/lib/accounts/schemas";
import { confirmPasswordReset } from "@/lib/accounts/resets";

export const dynamic = "force-dynamic";

export const POST = route(async (request) => {
  const { token, password } = await parseJson(request, resetConfirmInputSchema);
  await confirmPasswordReset(token, password);
  return NextResponse.json({ message: "Your password is changed. Sign in with the new one." });
});
