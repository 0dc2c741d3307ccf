import type { Metadata, Viewport } from "next";
import { connection } from "next/server";
import { fontStack } from "./font";
import "./fonts.css";
import "./globals.css";
import { Providers } from "@/components/system/providers";

export const metadata: Metadata = {
  title: { default: "Cantrove", template: "%s · Cantrove" },
  description: "Run can drives for community-built solar air heaters: drop points, hauls, sorting, and a fair share of cans for every heater.",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#fbf7f0" };

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // Every page is rendered per request: a prerendered page would carry no
  // nonce, and the Content-Security-Policy (proxy.ts) would block its scripts.
  await connection();
  return (
    <html lang="en" style={{ "--cantrove-font": fontStack() } as React.CSSProperties}>
      <body className="min-h-dvh">
        <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:bg-paper focus:p-2">
          Skip to content
        </a>
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
