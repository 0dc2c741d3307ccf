// Where the browser may load uploaded files from and send uploads to: the
// upload service's origin when it is known at build/start, plus any loopback
// port in this local setup (the upload fake's port differs per checkout).
function uploadOrigins() {
  const origins = new Set(["http://127.0.0.1:*", "http://localhost:*"]);
  for (const value of [process.env.UPLOADTHING_INGEST_URL, process.env.UPLOADTHING_API_URL]) {
    try {
      if (value) origins.add(new URL(value).origin);
    } catch {
      // a malformed value is reported by lib/env.ts at boot
    }
  }
  return [...origins].join(" ");
}

// Next's App Router inlines its bootstrap scripts, so scripts need
// 'unsafe-inline' unless every page is rendered with a per-request nonce.
const csp = [
  "default-src 'self'",
  "script-src 'self' 'unsafe-inline'",
  "style-src 'self' 'unsafe-inline'",
  `img-src 'self' data: blob: ${uploadOrigins()}`,
  "font-src 'self' data:",
  `connect-src 'self' ${uploadOrigins()}`,
  "worker-src 'self' blob:",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
  "frame-ancestors 'none'",
].join("; ");

const securityHeaders = [
  { key: "Content-Security-Policy", value: csp },
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Permissions-Policy", value: "camera=(self), geolocation=(self), microphone=()" },
  { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
];

/** @type {import('next').NextConfig} */
const nextConfig = {
  serverExternalPackages: ["knex", "pg", "nodemailer", "bcryptjs"],
  poweredByHeader: false,
  reactStrictMode: true,
  async headers() {
    return [{ source: "/:path*", headers: securityHeaders }];
  },
};

export default nextConfig;
