import { FILL_SHAPE_LABEL, type FillShape } from "@/lib/drives/fill";

// The bin's fill drawn inside a map pin by shape, so it reads without colour:
// an empty ring, a half-filled ring, a full disc with a bar; no badge when
// nothing recent was reported. Plain SVG markup for Leaflet's divIcon.
export function fillGlyphSvg(shape: FillShape | undefined): string {
  if (!shape || shape === "unknown") return "";
  const ring = `<circle cx="8" cy="8" r="6" fill="#fff" stroke="#1f1b16" stroke-width="2"/>`;
  const inner =
    shape === "empty"
      ? ""
      : shape === "part"
        ? `<path d="M2 8 a6 6 0 0 0 12 0 Z" fill="#1f1b16"/>`
        : `<circle cx="8" cy="8" r="6" fill="#b3261e" stroke="#1f1b16" stroke-width="2"/><rect x="7" y="4" width="2" height="8" fill="#fff"/>`;
  return `<svg data-fill="${shape}" role="img" aria-label="${FILL_SHAPE_LABEL[shape]}" width="16" height="16" viewBox="0 0 16 16" style="position:absolute;top:-6px;right:-8px">${ring}${inner}</svg>`;
}
