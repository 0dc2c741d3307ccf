import { NextResponse } from "next/server";
import { parseJson, route } from "@/lib/api/handler";
import { signUpInputSchema } from "@/lib/accounts/schemas";
import { signUp } from "@/lib/accounts/queries";

export const dynamic = "force-dynamic";

// Anyone may start a group; the client signs in with the same credentials next.
export const POST = route(async (request) => {
  const input = await parseJson(request, signUpInputSchema);
  const { groupId, slug } = await signUp(input);
  return NextResponse.json({ group: { id: groupId, slug, name: input.groupName }, role: "organiser" }, { status: 201 });
});
