import { NextResponse, type NextRequest } from "next/server";
import { newNonce, policyTemplate } from "@/lib/csp";

// Runs on every page request (never on /api, Next's static files or the map
// tiles, which need neither), so it stays cheap: one random nonce and one
// string replace; the rest of the policy is built once per process.
let template: string | undefined;

// A convenience only: visitors without a session cookie are sent to sign-in
// before the page renders. Every page and handler still checks the session and
// role itself (lib/auth/session.ts); a forged cookie gets no further than here.
const SESSION_COOKIES = ["next-auth.session-token", "__Secure-next-auth.session-token"];
const SIGNED_IN_AREAS = ["/dashboard", "/log", "/units", "/members", "/mail", "/home", "/ledger", "/organise", "/runs", "/search", "/account"];

function needsSession(pathname: string): boolean {
  return SIGNED_IN_AREAS.some((area) => pathname === area || pathname.startsWith(`${area}/`));
}

export function proxy(request: NextRequest) {
  const { pathname, search } = request.nextUrl;
  if (needsSession(pathname) && !SESSION_COOKIES.some((name) => request.cookies.has(name))) {
    const url = request.nextUrl.clone();
    url.pathname = "/signin";
    url.search = `?next=${encodeURIComponent(pathname + search)}`;
    return NextResponse.redirect(url);
  }
  const nonce = newNonce();
  template ??= policyTemplate(process.env);
  const policy = template.replace("{nonce}", nonce);
  // Next reads the nonce from the request's policy and puts it on its scripts.
  const headers = new Headers(request.headers);
  headers.set("x-nonce", nonce);
  headers.set("Content-Security-Policy", policy);
  const response = NextResponse.next({ request: { headers } });
  response.headers.set("Content-Security-Policy", policy);
  return response;
}

export const config = {
  matcher: ["/((?!api/|_next/|tiles/|favicon.ico).*)"],
};
