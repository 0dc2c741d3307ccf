import type { ElementType } from "react";

// Cantrove's mark: three can rims stacked under a low sun.
export function BrandMark({ size = 32 }: { size?: number }) {
  return (
    <svg width={size} height={size} viewBox="0 0 32 32" aria-hidden="true">
      <rect width="32" height="32" rx="8" fill="#1f1b16" />
      <circle cx="16" cy="9" r="4.5" fill="#f0b429" />
      <ellipse cx="16" cy="17" rx="7" ry="2.6" fill="none" stroke="#fbf7f0" strokeWidth="2" />
      <ellipse cx="16" cy="21.5" rx="7" ry="2.6" fill="none" stroke="#fbf7f0" strokeWidth="2" />
      <ellipse cx="16" cy="26" rx="7" ry="2.6" fill="none" stroke="#e07a4f" strokeWidth="2" />
    </svg>
  );
}

/**
 * The mark and name, linking home. `link` is the link component (next/link in
 * the signed-in header); the public header keeps a plain <a>, so this module
 * does not import next/link and public pages do not load its code.
 */
export function Brand({ link: Anchor = "a" }: { link?: ElementType }) {
  return (
    <Anchor href="/" className="tap flex gap-2 text-xl font-bold text-ink no-underline">
      <BrandMark />
      <span>Cantrove</span>
    </Anchor>
  );
}
