import localFont from "next/font/local";

// Source Sans 3's latin files (from @fontsource, shipped with the app) through
// next/font: it writes the @font-face rules, preloads the three files from the
// page's head (so they are fetched beside the stylesheet, not after it), and
// adds a fallback face with Arial's metrics adjusted to Source Sans 3's, so a
// first paint without the web font keeps its line breaks. font-display:
// optional: the browser uses the web font only when it is there by the first
// paint (it is cached after the first visit), so nothing re-wraps later.
// Letters outside latin come from the latin-ext faces in app/fonts.css.
// next/font reads these options at build time: they must be literals.
export const sourceSans = localFont({
  src: [
    { path: "../node_modules/@fontsource/source-sans-3/files/source-sans-3-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "../node_modules/@fontsource/source-sans-3/files/source-sans-3-latin-600-normal.woff2", weight: "600", style: "normal" },
    { path: "../node_modules/@fontsource/source-sans-3/files/source-sans-3-latin-700-normal.woff2", weight: "700", style: "normal" },
  ],
  display: "optional",
  variable: "--font-source-sans",
  adjustFontFallback: "Arial",
  preload: true,
});

/**
 * The page's font stack: next/font's face, then the latin-ext faces (a letter
 * missing from the first is looked up in the next family, so they must come
 * before the metric fallback, which has every letter), then that fallback.
 */
export function fontStack(): string {
  const [face, fallback] = sourceSans.style.fontFamily.split(",").map((name) => name.trim());
  return `${face}, "Source Sans 3", ${fallback}, system-ui, sans-serif`;
}
