import { byEmail, type LimitRule, type Limits } from "@/lib/api/rate-limit-rules";

// Abuse limits on what anyone may post on a public drive page. A donor pledges
// a few times a season and a passer-by reports a bin now and then; a script
// does thousands. Per client address, and per e-mail address for pledges.
const HOUR = 3600;

export const PUBLIC_LIMITS = {
  pledgePerClient: { name: "pledge-client", points: 20, durationSec: HOUR },
  pledgePerAddress: { name: "pledge-address", points: 5, durationSec: HOUR },
  fillReportPerClient: { name: "fill-report-client", points: 20, durationSec: HOUR },
} as const satisfies Record<string, LimitRule>;

// Each form's limits, shared by its public route and its server action.
export const PLEDGE_LIMITS = [
  { rule: PUBLIC_LIMITS.pledgePerClient, by: "client" },
  { rule: PUBLIC_LIMITS.pledgePerAddress, by: byEmail },
] as const satisfies Limits;
export const FILL_REPORT_LIMITS = [{ rule: PUBLIC_LIMITS.fillReportPerClient, by: "client" }] as const satisfies Limits;
