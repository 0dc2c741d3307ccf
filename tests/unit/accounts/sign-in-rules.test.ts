import { describe, expect, it } from "vitest";
import { CLIENT_RULE, PAIR_LIMIT, PAIR_RULES, pairKey, refusalMessage } from "@/lib/accounts/sign-in-rules";
import { retryAfterSeconds, waitText } from "@/lib/api/rate-limit-rules";

describe("sign-in rules", () => {
  it("back off in steps: each longer window allows more tries than the one before", () => {
    for (let i = 1; i < PAIR_RULES.length; i += 1) {
      expect(PAIR_RULES[i].durationSec).toBeGreaterThan(PAIR_RULES[i - 1].durationSec);
      expect(PAIR_RULES[i].points).toBeGreaterThan(PAIR_RULES[i - 1].points);
    }
    expect(PAIR_LIMIT).toBe(5);
    expect(new Set([...PAIR_RULES, CLIENT_RULE].map((r) => r.name)).size).toBe(PAIR_RULES.length + 1);
  });

  it("keys an e-mail and a client so every client of one e-mail shares a prefix", () => {
    expect(pairKey("Ann@Example.org", "127.0.0.9")).toBe("ann@example.org|127.0.0.9");
    expect(pairKey("a_b%c@x.test", "::1").startsWith(pairKey("a_b%c@x.test", ""))).toBe(true);
  });

  it("names the way out in the refusal", () => {
    expect(refusalMessage("pair", 30)).toBe(
      "Too many sign-in tries for this e-mail from your network. Try again in a minute, or reset your password: the reset e-mail lets you straight back in.",
    );
    expect(refusalMessage("client", 899)).toBe("Too many failed sign-ins from your network. Try again in 15 minutes.");
  });
});

describe("limit answers", () => {
  it("round the wait up to whole seconds, never 0", () => {
    expect(retryAfterSeconds(0)).toBe(1);
    expect(retryAfterSeconds(1)).toBe(1);
    expect(retryAfterSeconds(1001)).toBe(2);
    expect(retryAfterSeconds(-5)).toBe(1);
  });

  it("say the wait in words", () => {
    expect(waitText(1)).toBe("a minute");
    expect(waitText(60)).toBe("a minute");
    expect(waitText(61)).toBe("2 minutes");
    expect(waitText(3600)).toBe("60 minutes");
    expect(waitText(86_400)).toBe("24 hours");
  });
});
