// Safe to import anywhere: no I/O. The client's address as the app trusts it.
//
// Route handlers never see the socket, so the app's own server (server.mjs)
// works the address out from the socket peer and TRUSTED_PROXY_HOPS
// (scripts/lib/client-chain.mjs), writes it into CLIENT_HEADER and drops any
// value a client sent under that name. Everything reads it through here.

export const CLIENT_HEADER = "x-cantrove-client";

type HeaderBag = Headers | Record<string, string | string[] | undefined> | undefined | null;

/** The address the server worked out for this request; "unknown" when not started through server.mjs. */
export function clientAddress(headers: HeaderBag): string {
  if (!headers) return "unknown";
  const value = headers instanceof Headers ? headers.get(CLIENT_HEADER) : headers[CLIENT_HEADER];
  const one = Array.isArray(value) ? value[0] : value;
  return one ? one.slice(0, 64) : "unknown";
}
