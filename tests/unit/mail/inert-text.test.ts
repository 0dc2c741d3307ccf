import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { inertName, inertNote, inertText } from "@/lib/mail/inert-text";

// What a mail program would turn into a live link: a scheme, "www.", a host
// name with a dot before a letter, or an address with "@" (common practice, no
// published source: every major mail client autolinks these).
const LIVE = /:\/\/|\bwww\.|[\p{L}\p{N}]\.[\p{L}]|\S@\S|\bmailto:|\bjavascript:/iu;

describe("inertText", () => {
  it("turns a link into plain text: scheme dropped, dots broken", () => {
    expect(inertText("see http://x.example/a now", { max: 200 })).toBe("see x[.]example/a now");
    expect(inertText("HTTPS://Evil.Example.org/path?q=1", { max: 200 })).toBe("Evil[.]Example[.]org/path?q=1");
    expect(inertText("go to www.spam.example", { max: 200 })).toBe("go to www[.]spam[.]example");
  });

  it("breaks e-mail addresses, mailto: and javascript: links", () => {
    expect(inertText("write to win@prize.example", { max: 200 })).toBe("write to win [at] prize[.]example");
    expect(inertText("mailto:a@b.example", { max: 200 })).toBe("a [at] b[.]example");
    expect(inertText("javascript:alert(1)", { max: 200 })).toBe("alert(1)");
  });

  it("breaks the dots of an address written with digits, but keeps ordinary numbers", () => {
    expect(inertText("at 10.0.0.1/login", { max: 200 })).toBe("at 10[.]0[.]0[.]1/login");
    expect(inertText("about 3.5 bags", { max: 200 })).toBe("about 3.5 bags");
  });

  it("folds look-alike characters mail programs would still link", () => {
    // Fullwidth letters and the ideographic full stop (IDNA treats it as a dot, UTS #46).
    expect(inertText("ｈｔｔｐ：／／ｅｖｉｌ。ｅｘａｍｐｌｅ", { max: 200 })).toBe("evil[.]example");
    expect(inertText("htthttp://p://x.example", { max: 200 })).not.toMatch(LIVE);
  });

  it("keeps a name on one line with no control or invisible characters", () => {
    expect(inertName("Bram\r\nBcc: victim@x.example\u0000\u202E")).toBe("Bram Bcc: victim [at] x[.]example");
    expect(inertName("  Ada \t  Lovelace ")).toBe("Ada Lovelace");
    expect(inertName("Zoë Ó Súilleabháin")).toBe("Zoë Ó Súilleabháin");
  });

  it("caps the length, counting characters rather than UTF-16 units", () => {
    expect(Array.from(inertName("é".repeat(500)))).toHaveLength(60);
    expect(inertName("x".repeat(500)).endsWith("…")).toBe(true);
    expect(Array.from(inertNote("🥫".repeat(1000)))).toHaveLength(300);
    expect(inertText(null, { max: 10 })).toBe("");
  });

  it("never leaves anything link-shaped, a line break or a control character, whatever comes in", () => {
    const pieces = fc.constantFrom("http://", "https://", "www.", ".", "@", "example", "com", "x", " ", "\n", "\r", "\u0000", "mailto:", "：／／", "。", "/", "a1", "-");
    const input = fc.oneof(fc.string(), fc.array(pieces, { maxLength: 30 }).map((a) => a.join("")));
    fc.assert(
      fc.property(input, (raw) => {
        const out = inertNote(raw);
        expect(out).not.toMatch(LIVE);
        expect(out).not.toMatch(/[\p{Cc}\p{Cf}\u2028\u2029]/u);
        expect(Array.from(out).length).toBeLessThanOrEqual(300);
      }),
      { numRuns: 2000 },
    );
  });
});
