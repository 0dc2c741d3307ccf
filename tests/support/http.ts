import { APP_URL, DEMO_PASSWORD } from "./env";

// A tiny HTTP client with a cookie jar, signing in through next-auth's
// credentials flow exactly as the contract describes.
//
// The test server trusts one proxy hop (TRUSTED_PROXY_HOPS=1 in scripts/test.ts):
// each client plays the proxy in front of its own made-up address, so per-client
// limits count each test's client on its own, as they would count real people.
export class ApiClient {
  private cookies = new Map<string, string>();
  /** A made-up client address from 198.18.0.0/15, the range RFC 2544 sets aside for tests. */
  address = `198.${18 + Math.floor(Math.random() * 2)}.${Math.floor(Math.random() * 256)}.${1 + Math.floor(Math.random() * 254)}`;

  constructor(readonly baseUrl = APP_URL) {}

  private cookieHeader(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
  }

  private keep(res: Response): void {
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(";");
      const eq = pair.indexOf("=");
      const name = pair.slice(0, eq).trim();
      const value = pair.slice(eq + 1);
      if (/max-age=0/i.test(line) || value === "") this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
  }

  async request(method: string, path: string, body?: unknown, headers: Record<string, string> = {}): Promise<Response> {
    const res = await fetch(this.baseUrl + path, {
      method,
      redirect: "manual",
      signal: AbortSignal.timeout(15_000),
      headers: {
        cookie: this.cookieHeader(),
        "x-forwarded-for": this.address,
        ...(body !== undefined && typeof body !== "string" ? { "content-type": "application/json" } : {}),
        ...headers,
      },
      body: body === undefined ? undefined : typeof body === "string" ? body : JSON.stringify(body),
    });
    this.keep(res);
    return res;
  }

  get(path: string, headers?: Record<string, string>) {
    return this.request("GET", path, undefined, headers);
  }

  post(path: string, body?: unknown, headers?: Record<string, string>) {
    return this.request("POST", path, body, headers);
  }

  async json<T = unknown>(method: string, path: string, body?: unknown, headers?: Record<string, string>) {
    const res = await this.request(method, path, body, headers);
    const text = await res.text();
    return { status: res.status, body: (text ? JSON.parse(text) : null) as T };
  }

  /** Returns the HTTP status of the credentials callback (200 on success, 401 on a wrong password). */
  async signIn(email: string, password = DEMO_PASSWORD): Promise<number> {
    const csrf = await this.json<{ csrfToken: string }>("GET", "/api/auth/csrf");
    const form = new URLSearchParams({ csrfToken: csrf.body.csrfToken, email, password, json: "true" });
    const res = await this.request("POST", "/api/auth/callback/credentials", form.toString(), {
      "content-type": "application/x-www-form-urlencoded",
    });
    await res.text();
    return res.status;
  }

  hasSession(): boolean {
    return [...this.cookies.keys()].some((k) => k.includes("session-token"));
  }
}

export async function signedIn(email: string): Promise<ApiClient> {
  const client = new ApiClient();
  const status = await client.signIn(email);
  if (status !== 200 || !client.hasSession()) throw new Error(`sign-in as ${email} failed (${status})`);
  return client;
}

/** Signs each e-mail in, all at once; the clients come back in the same order. */
export async function signedInAll<const T extends readonly string[]>(...emails: T): Promise<{ -readonly [K in keyof T]: ApiClient }> {
  return (await Promise.all(emails.map((email) => signedIn(email)))) as { -readonly [K in keyof T]: ApiClient };
}
