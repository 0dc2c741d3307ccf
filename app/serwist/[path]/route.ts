import { createSerwistRoute } from "@serwist/turbopack";

// The service worker (app/sw.ts), bundled by Serwist with esbuild when the app
// is built, and served at /serwist/sw.js (the way @serwist/turbopack documents
// it for the App Router). Precached: Next's static files (scripts, styles,
// fonts) and the app icons; map tiles are kept per person instead (app/sw.ts).
export const { dynamic, dynamicParams, revalidate, generateStaticParams, GET } = createSerwistRoute({
  swSrc: "app/sw.ts",
  useNativeEsbuild: true,
  globPatterns: [".next/static/**/*.{js,css,woff2}", "public/icons/*.png"],
  maximumFileSizeToCacheInBytes: 2 * 1024 * 1024,
});
