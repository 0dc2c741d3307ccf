import { NextResponse } from "next/server";
import { route } from "@/lib/api/handler";
import { requireUser } from "@/lib/auth/session";

export const dynamic = "force-dynamic";

export const GET = route(async () => {
  const { user, group, role } = await requireUser();
  return NextResponse.json({ user, group, role });
});
