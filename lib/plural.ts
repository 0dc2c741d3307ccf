/**
 * Counts with a noun, spelled right for the number ("1 drop point",
 * "2 drop points", "0 heaters"). English has only "one" and "other", but
 * Intl.PluralRules decides which applies (1.5 is "other", so is 0), not a
 * hand-written `n === 1`.
 */
const rules = new Intl.PluralRules("en-GB");
const numbers = new Intl.NumberFormat("en-GB", { maximumFractionDigits: 2 });

export interface Noun {
  one: string;
  other: string;
}

/** A noun whose plural adds "s", unless told otherwise. */
export function noun(one: string, other = `${one}s`): Noun {
  return { one, other };
}

/** The noun's form for `n`: "bag" for 1, "bags" otherwise. */
export function plural(n: number, word: Noun | string): string {
  const w = typeof word === "string" ? noun(word) : word;
  return rules.select(n) === "one" ? w.one : w.other;
}

/** "1 bag", "2 bags", "1,200 cans": the number as the app shows numbers, then the noun. */
export function countOf(n: number, word: Noun | string, format: (n: number) => string = (x) => numbers.format(x)): string {
  return `${format(n)} ${plural(n, word)}`;
}
