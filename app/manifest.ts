import type { MetadataRoute } from "next";

// The web app manifest (served at /manifest.webmanifest): lets a volunteer or
// organiser add Cantrove to a phone's home screen. It opens at /home, which
// sends each signed-in person to their own role's landing page (and anyone
// else to sign-in). Icons are drawn from app/icon.svg by scripts/make-icons.ts.
// The service worker (app/sw.ts, registered by signed-in pages) keeps /log, the person's runs and their
// map tiles on the phone, so the start URL opens with no signal after one online visit.
export default function manifest(): MetadataRoute.Manifest {
  return {
    id: "/home",
    name: "Cantrove",
    short_name: "Cantrove",
    description: "Log hauls, sorts and pickup runs for your group's can drive.",
    start_url: "/home",
    scope: "/",
    display: "standalone",
    background_color: "#fbf7f0",
    theme_color: "#1f1b16",
    icons: [
      { src: "/icons/icon-192.png", sizes: "192x192", type: "image/png", purpose: "any" },
      { src: "/icons/icon-512.png", sizes: "512x512", type: "image/png", purpose: "any" },
      { src: "/icons/icon-maskable-512.png", sizes: "512x512", type: "image/png", purpose: "maskable" },
    ],
  };
}
