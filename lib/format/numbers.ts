import { countOf, plural, type Noun } from "@/lib/plural";
import type { Look } from "./look";
import { memo } from "./memo";

// Numbers as the group's locale writes them ("1,234.5" in en-GB, "1 234,5"
// in en-ZA), and counts with a noun spelled right for the number (lib/plural.ts:
// the nouns are English, so English's plural rules pick the form).

type Locale = Pick<Look, "locale">;

export function numberFormat(locale: string, options: Intl.NumberFormatOptions): Intl.NumberFormat {
  return memo("number", locale, options, () => new Intl.NumberFormat(locale, options));
}

/** "1,234" or, with digits, "1,234.5": at most `maxDigits` decimals, no trailing zeros. */
export function formatNumber(n: number, look: Locale, maxDigits = 0): string {
  return numberFormat(look.locale, { maximumFractionDigits: maxDigits }).format(n);
}

/** "45%" from 0.45; `digits` decimals at most. */
export function formatPercent(share: number, look: Locale, digits = 0): string {
  return numberFormat(look.locale, { style: "percent", maximumFractionDigits: digits }).format(share);
}

/** "1 can", "1,200 cans": the number in the group's locale, then the noun's form for it. */
export function formatCount(n: number, word: Noun | string, look: Locale): string {
  return countOf(n, word, (x) => formatNumber(x, look, 2));
}

export { plural };
