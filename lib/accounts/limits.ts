import { byEmail, type LimitRule, type Limits } from "@/lib/api/rate-limit-rules";

// Abuse limits on the account routes that send mail or take a token from anyone.
// Counted per client address and per target (an address, an invitation), so
// neither a single client nor a crowd can turn the app into a mail cannon.
// The numbers are ours: generous for people, small for scripts.
const HOUR = 3600;

export const ACCOUNT_LIMITS = {
  /** The contract asks for at least 30 sign-ups an hour from one address (a class signing up together). */
  signUpPerClient: { name: "signup-client", points: 40, durationSec: HOUR },
  signUpPerAddress: { name: "signup-address", points: 3, durationSec: HOUR },
  resetPerClient: { name: "reset-client", points: 20, durationSec: HOUR },
  resetPerAddress: { name: "reset-address", points: 3, durationSec: HOUR },
  invitePerAddress: { name: "invite-address", points: 5, durationSec: 24 * HOUR },
  resendPerInvitation: { name: "resend-invitation", points: 3, durationSec: HOUR },
  resendPerClient: { name: "resend-client", points: 30, durationSec: HOUR },
  /** Asking for the e-mail proof link again. */
  verifyResendPerClient: { name: "verify-resend-client", points: 20, durationSec: HOUR },
  /** Invitation, reset and verification tokens are 256-bit, but nobody needs hundreds of tries. */
  tokenPerClient: { name: "token-client", points: 30, durationSec: 15 * 60 },
} as const satisfies Record<string, LimitRule>;

// Each operation's limits, shared by its route and its form's server action.
export const SIGN_UP_LIMITS = [
  { rule: ACCOUNT_LIMITS.signUpPerClient, by: "client" },
  { rule: ACCOUNT_LIMITS.signUpPerAddress, by: byEmail },
] as const satisfies Limits;
export const RESET_REQUEST_LIMITS = [
  { rule: ACCOUNT_LIMITS.resetPerClient, by: "client" },
  { rule: ACCOUNT_LIMITS.resetPerAddress, by: byEmail },
] as const satisfies Limits;
export const INVITE_LIMITS = [{ rule: ACCOUNT_LIMITS.invitePerAddress, by: byEmail }] as const satisfies Limits;
export const RESEND_INVITATION_LIMITS = [
  { rule: ACCOUNT_LIMITS.resendPerClient, by: "client" },
  { rule: ACCOUNT_LIMITS.resendPerInvitation, by: ({ params }: { params: { id: string } }) => params.id },
] as const satisfies Limits;
export const VERIFY_RESEND_LIMITS = [{ rule: ACCOUNT_LIMITS.verifyResendPerClient, by: "client" }] as const satisfies Limits;
/** Every form or route that takes an invitation, reset or verification token. */
export const TOKEN_LIMITS = [{ rule: ACCOUNT_LIMITS.tokenPerClient, by: "client" }] as const satisfies Limits;
