// Text typed by someone without an account (a pledge's name, a fill report's
// note) goes into e-mails we send. Mail programs turn anything that looks like
// a link or an address into a live one, so such text is made inert: one line,
// no control characters, schemes dropped, dots in host names and "@" broken,
// and a length cap. It is never used in a Subject or a first line.

export interface InertOptions {
  /** Most characters kept (code points); longer text ends with "…". */
  max: number;
}

// Full stops that IDNA treats as dots in host names (UTS #46): ideographic, fullwidth, halfwidth.
const DOT_LIKE = /[\u3002\uFF0E\uFF61]/g;
// Line and paragraph breaks, tabs and other spacing become one space.
const BREAKS = /[\r\n\t\v\f\u0085\u2028\u2029]+/g;
// Control (Cc), format (Cf: bidi overrides, zero-width characters), private-use and unpaired surrogates.
const INVISIBLE = /[\p{Cc}\p{Cf}\p{Co}\p{Cs}]/gu;
// A URL scheme, with or without "//" (http://, mailto:, javascript:…).
const SCHEME = /\b(?:[a-z][a-z0-9+.-]{0,30}:\/\/+|(?:mailto|tel|sms|callto|javascript|vbscript|data|file|ftp|news|xmpp|sip):)/giu;
// A dot before a letter, as in a host name ("3.5 bags" keeps its dot) …
const HOST_DOT = /(?<=[\p{L}\p{N}_-])\.(?=\p{L})/gu;
// … and the dots of a dotted-quad address.
const IP = /\b\d{1,3}(?:\.\d{1,3}){3}\b/g;
const WWW = /\bwww\./giu;
const AT = /(?<=\S)@(?=\S)/gu;

/** Makes anonymous text safe to quote in a plain-text e-mail. */
export function inertText(value: string | null | undefined, { max }: InertOptions): string {
  if (!value) return "";
  let text = value
    .normalize("NFKC") // folds fullwidth "ｈｔｔｐ：／／" and the like into what mail programs would link
    .replace(DOT_LIKE, ".")
    .replace(BREAKS, " ")
    .replace(INVISIBLE, "")
    .replace(/\s+/gu, " ")
    .trim();
  // Dropping a scheme can join the pieces around it into a new one ("htthttp://p://"), so repeat.
  for (let before = ""; before !== text; ) {
    before = text;
    text = text.replace(SCHEME, "").replace(/:\/\/+/g, " ");
  }
  text = text
    .replace(IP, (ip) => ip.replaceAll(".", "[.]"))
    .replace(HOST_DOT, "[.]")
    .replace(WWW, (w) => `${w.slice(0, 3)}[.]`)
    .replace(AT, " [at] ")
    .replace(/\s+/gu, " ")
    .trim();
  const chars = Array.from(text);
  return chars.length > max ? `${chars.slice(0, Math.max(0, max - 1)).join("").trimEnd()}…` : text;
}

/** A person's name from a public form: one short line. */
export const inertName = (value: string | null | undefined) => inertText(value, { max: 60 });

/** A note from a public form, quoted to organisers. */
export const inertNote = (value: string | null | undefined) => inertText(value, { max: 300 });
