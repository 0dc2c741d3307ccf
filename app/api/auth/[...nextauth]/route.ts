import NextAuth from "next-auth";
import type { NextRequest } from "next/server";
import { authOptions } from "@/lib/auth/options";
import { callbackUrlRepair } from "@/lib/auth/callback-url-guard";

const nextAuth = NextAuth(authOptions);

type Ctx = { params: Promise<{ nextauth: string[] }> };

// A malformed callbackUrl would be a 500 inside next-auth: repaired first.
const handler = (request: NextRequest, context: Ctx) => callbackUrlRepair(request) ?? nextAuth(request, context);

export { handler as GET, handler as POST };
