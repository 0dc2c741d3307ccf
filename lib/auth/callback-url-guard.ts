import "server-only";
import { NextResponse, type NextRequest } from "next/server";
import { env } from "@/lib/env";
import { keptCallbackUrl } from "./safe-redirect";

// next-auth refuses a malformed callbackUrl (query or cookie) as a server
// configuration error, a 500, before any of our callbacks run. So its route
// sends such a request back to itself once, with the callbackUrl replaced by
// "/" and the cookie cleared; everything else goes through untouched.
const COOKIES = ["next-auth.callback-url", "__Secure-next-auth.callback-url"];

export function callbackUrlRepair(request: NextRequest): NextResponse | null {
  const origins = [request.nextUrl.origin, new URL(env().NEXTAUTH_URL ?? env().APP_URL).origin];
  const url = request.nextUrl.clone();
  const param = url.searchParams.get("callbackUrl");
  const fixParam = param !== null && keptCallbackUrl(param, origins) !== param;
  if (fixParam) url.searchParams.set("callbackUrl", "/");
  const badCookies = COOKIES.filter((name) => {
    const value = request.cookies.get(name)?.value;
    return value !== undefined && keptCallbackUrl(value, origins) !== value;
  });
  if (!fixParam && !badCookies.length) return null;
  // 307 keeps the method and body, so a sign-in POST is simply sent again.
  const response = NextResponse.redirect(url, 307);
  for (const name of badCookies) response.cookies.set(name, "", { maxAge: 0, path: "/", secure: name.startsWith("__Secure-") });
  return response;
}
