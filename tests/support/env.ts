// Where the running test stack is; set by scripts/test.ts.
export const APP_URL = process.env.CANTROVE_APP_URL ?? "http://127.0.0.1:3100";
export const MAIL_API_URL = process.env.MAIL_API_URL ?? "http://127.0.0.1:8035";
export const DEMO_PASSWORD = "cantrove-demo";
export const DEMO = {
  organiser: "organiser@cantrove.test",
  volunteer: "volunteer@cantrove.test",
  builder: "builder@cantrove.test",
  otherOrganiser: "organiser@elsewhere.test",
} as const;
