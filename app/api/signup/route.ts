import { NextResponse } from "next/server";
import { parseJson, route } from "@/lib/api/handler";
import { signUpInputSchema } from "@/lib/accounts/schemas";
import { signUp } from "@/lib/accounts/sign-up";

export const dynamic = "force-dynamic";

// Anyone may start a group; signing in waits until the link mailed to the address is opened.
// An address that already has an account gets this same answer (its owner gets a mail).
export const POST = route(async (request) => {
  const input = await parseJson(request, signUpInputSchema);
  const { groupId, slug } = await signUp(input);
  return NextResponse.json({ group: { id: groupId, slug, name: input.groupName }, role: "organiser" }, { status: 201 });
});
