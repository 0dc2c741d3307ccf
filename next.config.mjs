import { withSerwist } from "@serwist/turbopack";

// Pages get their Content-Security-Policy from proxy.ts, with a fresh nonce per
// request (lib/csp.ts). What proxy.ts does not run on — JSON, Next's static
// files, the map tiles — gets a policy under which nothing loads or frames it.
// The two sets of paths must not overlap: two policies on one answer would
// both be enforced.
const nonPagePolicy = "default-src 'none'; style-src 'unsafe-inline'; base-uri 'none'; form-action 'self'; frame-ancestors 'none'";
const NON_PAGES = ["/api/:path*", "/_next/:path*", "/tiles/:path*", "/favicon.ico"];

const securityHeaders = [
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Permissions-Policy", value: "camera=(self), geolocation=(self), microphone=()" },
  { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
];

// Bench-only routes (app/api/bench/**/route.bench.ts) are part of the build only
// when it is made with CANTROVE_BENCH=1, as `npm run bench` does; otherwise Next
// sees no route there and the path is an ordinary 404.
const PAGE_EXTENSIONS = ["tsx", "ts", "jsx", "js"];

/** @type {import('next').NextConfig} */
const nextConfig = {
  pageExtensions: process.env.CANTROVE_BENCH === "1" ? [...PAGE_EXTENSIONS, "bench.ts"] : PAGE_EXTENSIONS,
  // Serwist's build side (which bundles the service worker when the app is built) is loaded from
  // node_modules, not bundled: its hundreds of modules would lengthen every module id in every
  // chunk (Turbopack sizes ids by the module count), which the public drive page pays for.
  serverExternalPackages: ["knex", "pg", "nodemailer", "bcryptjs", "@serwist/turbopack", "@serwist/build", "@serwist/utils"],
  poweredByHeader: false,
  reactStrictMode: true,
  // Browsers that ask for /favicon.ico without reading the page get the mark (app/icon.svg).
  async rewrites() {
    return [{ source: "/favicon.ico", destination: "/icon.svg" }];
  },
  async headers() {
    return [
      { source: "/:path*", headers: securityHeaders },
      ...NON_PAGES.map((source) => ({ source, headers: [{ key: "Content-Security-Policy", value: nonPagePolicy }] })),
    ];
  },
};

// withSerwist keeps esbuild (which bundles the service worker, app/serwist/[path]/route.ts) out of the server bundle.
export default withSerwist(nextConfig);
