import http from "node:http";
import { APP_URL } from "@/tests/support/env";

// Sign-in over plain node:http so each test can come from its own loopback
// address (127.0.0.x): the server sees a distinct client, and the other test
// files signing in from 127.0.0.1 are not touched by these failures.
export function call(localAddress: string, method: string, path: string, body?: string, headers: Record<string, string> = {}) {
  return new Promise<{ status: number; text: string; cookies: string[]; location?: string }>((resolve, reject) => {
    const url = new URL(path, APP_URL);
    const req = http.request({ host: url.hostname, port: url.port, path: url.pathname + url.search, method, localAddress, headers }, (res) => {
      let text = "";
      res.on("data", (c) => (text += c));
      res.on("end", () => resolve({ status: res.statusCode ?? 0, text, cookies: (res.headers["set-cookie"] ?? []).map((c) => c.split(";")[0]), location: res.headers.location }));
    });
    req.on("error", reject);
    req.end(body);
  });
}

export interface SignInAnswer {
  status: number;
  /** next-auth's `error` param: "CredentialsSignin" for the plain miss, else the thrown message. */
  error: string | null;
  signedIn: boolean;
  url: string;
}

/** A csrf token and its cookie, fetched once and reusable for many tries. */
export async function csrfFrom(localAddress: string) {
  const csrf = await call(localAddress, "GET", "/api/auth/csrf");
  return { csrfToken: (JSON.parse(csrf.text) as { csrfToken: string }).csrfToken, cookie: csrf.cookies.join("; ") };
}

interface SignInOptions {
  headers?: Record<string, string>;
  /** Extra form fields, e.g. callbackUrl. */
  fields?: Record<string, string>;
  csrf?: { csrfToken: string; cookie: string };
}

export async function signInFrom(localAddress: string, email: string, password: string, options: SignInOptions = {}): Promise<SignInAnswer> {
  const { csrfToken, cookie } = options.csrf ?? (await csrfFrom(localAddress));
  const form = new URLSearchParams({ csrfToken, email, password, json: "true", ...options.fields }).toString();
  const res = await call(localAddress, "POST", "/api/auth/callback/credentials", form, {
    cookie,
    "content-type": "application/x-www-form-urlencoded",
    ...options.headers,
  });
  const url = res.text && res.status < 500 ? ((JSON.parse(res.text) as { url?: string }).url ?? "") : "";
  return { status: res.status, url, error: url ? new URL(url, APP_URL).searchParams.get("error") : null, signedIn: res.cookies.some((c) => c.includes("session-token=")) };
}
