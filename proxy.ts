import { NextResponse, type NextRequest } from "next/server";

// A convenience only: visitors without a session cookie are sent to sign-in
// before the page renders. Every page and handler still checks the session and
// role itself (lib/auth/session.ts); a forged cookie gets no further than here.
const SESSION_COOKIES = ["next-auth.session-token", "__Secure-next-auth.session-token"];

export function proxy(request: NextRequest) {
  const hasSession = SESSION_COOKIES.some((name) => request.cookies.has(name));
  if (hasSession) return NextResponse.next();
  const url = request.nextUrl.clone();
  url.pathname = "/signin";
  url.search = `?next=${encodeURIComponent(request.nextUrl.pathname + request.nextUrl.search)}`;
  return NextResponse.redirect(url);
}

export const config = {
  matcher: ["/dashboard/:path*", "/log/:path*", "/units/:path*", "/members/:path*", "/mail/:path*", "/home", "/ledger/:path*", "/organise/:path*", "/runs/:path*"],
};
