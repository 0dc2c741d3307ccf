import { describe, expect, it } from "vitest";
import { weeklySummaryMail } from "@/lib/notify/mails";
import { DEFAULT_LOOK } from "@/lib/format";

const base = {
  look: DEFAULT_LOOK,
  links: { unsubscribePage: "https://app.test/unsubscribe/t", settings: "https://app.test/account" },
  dashboardUrl: "https://app.test/dashboard",
  organiserName: "Mara Quillon",
  groupName: "Larkhollow Warm Rooms Circle",
  weekOf: "2026-11-30",
  runsDone: [],
};
const drive = { name: "Winter drive", fullBins: [], pledgesDue: [] };

describe("the weekly summary's progress line", () => {
  it("says the target is reached instead of a capped share once no cans are still needed", () => {
    const { text } = weeklySummaryMail({ ...base, drives: [{ ...drive, goodCans: 852, targetCans: 551, remaining: 0 }] });
    expect(text).toContain("Progress: 852 good cans of 551: target reached");
  });

  it("gives the share and what is still to come while short, and names no target without units", () => {
    const short = weeklySummaryMail({ ...base, drives: [{ ...drive, goodCans: 40, targetCans: 278, remaining: 238 }] }).text;
    expect(short).toContain("Progress: 40 good cans of 278 (14%); 238 still to come");
    const none = weeklySummaryMail({ ...base, drives: [{ ...drive, goodCans: 3, targetCans: 0, remaining: 0 }] }).text;
    expect(none).toContain("3 good cans; no heater units planned yet, so no target");
    expect(none).toContain("Stop these e-mails: https://app.test/unsubscribe/t");
  });
});
