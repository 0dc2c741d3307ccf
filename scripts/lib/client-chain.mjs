// The client's address from the socket peer and X-Forwarded-For, trusting only
// the given number of proxy hops. Plain JS so server.mjs can use it unbuilt.
// Each trusted proxy appends the address it saw; a client can write anything
// left of that, so only the entry `trustedHops` places from the right of
// `forwarded + peer` is read.

/** @param {string | undefined} peer @param {string | string[] | undefined} forwardedFor @param {number} trustedHops */
export function resolveClientAddress(peer, forwardedFor, trustedHops) {
  const raw = Array.isArray(forwardedFor) ? forwardedFor.join(",") : forwardedFor ?? "";
  const chain = raw.split(",").map((p) => p.trim()).filter(Boolean);
  chain.push(peer ?? "unknown");
  const hops = Number.isFinite(trustedHops) ? Math.max(0, Math.floor(trustedHops)) : 0;
  const picked = chain[Math.max(0, chain.length - 1 - hops)];
  return picked.replace(/^::ffff:/, "").replace(/^\[|\]$/g, "").slice(0, 64) || "unknown";
}
