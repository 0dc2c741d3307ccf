import "server-only";
import { AppError } from "@/lib/api/errors";
import { consumeLimit, type LimitRule } from "@/lib/api/rate-limit";

// Account mails per target address: a few an hour is plenty for a person and
// stops the app being used to flood someone's inbox. Beyond that the mail is
// dropped without a word, so the answer still says nothing about the address.
export const SIGN_UP_MAIL_RULE: LimitRule = { name: "mail-sign-up", points: 3, durationSec: 60 * 60 };
export const RESET_MAIL_RULE: LimitRule = { name: "mail-reset", points: 3, durationSec: 60 * 60 };

/** True when another mail of this kind may go to the address now (and counts it). */
export async function mayMail(rule: LimitRule, address: string): Promise<boolean> {
  try {
    await consumeLimit(rule, address.toLowerCase());
    return true;
  } catch (error) {
    if (error instanceof AppError && error.code === "rate_limited") return false;
    throw error;
  }
}
