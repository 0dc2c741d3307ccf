import { DEMO } from "@/tests/support/env";
import { testDb } from "@/tests/support/db";
import { demoFixture } from "@/tests/support/fixtures";
import { unsubscribeToken } from "@/lib/notify/unsubscribe";

// The screens people open most, each as the role that uses it (the issue
// "fast, steady, readable screens on a mid-range phone"). Shared by the
// Lighthouse, axe and touch-target tests so they all cover the same pages.
export type Role = "public" | keyof Pick<typeof DEMO, "organiser" | "volunteer" | "builder">;

export interface Screen {
  path: string;
  role: Role;
  /** A page measured over its Lighthouse budget and not yet fixed: its audit is skipped (reported as skipped, never as passed), with why. */
  overBudget?: string;
}

export const DRIVE_PAGE = "/drives/larkhollow-winter-2026";

/** The pages held to the Lighthouse budget. */
export const SCREENS: Screen[] = [
  { path: "/", role: "public" },
  { path: DRIVE_PAGE, role: "public" },
  { path: "/plan", role: "public" },
  { path: "/dashboard", role: "organiser" },
  { path: "/ledger", role: "organiser" },
  { path: "/units", role: "organiser" },
  { path: "/runs/new", role: "organiser" },
  { path: "/members", role: "organiser" },
  { path: "/log", role: "volunteer" },
];

/** Every role's view of the pages it uses, for the accessibility and touch checks. */
export async function screensByRole(): Promise<Screen[]> {
  const demo = await demoFixture();
  const volunteerId = (await testDb()("users").where({ email: DEMO.volunteer }).first()).id as string;
  const run = await testDb()("pickup_runs").where({ drive_id: demo.demoDriveId }).orderBy("created_at").first();
  return [
    ...SCREENS,
    { path: "/signin", role: "public" },
    { path: "/signup", role: "public" },
    { path: "/forgot", role: "public" },
    { path: "/runs", role: "organiser" },
    ...(run ? [{ path: `/runs/${run.id}`, role: "organiser" as const }, { path: `/runs/${run.id}`, role: "volunteer" as const }] : []),
    { path: "/organise/drives", role: "organiser" },
    { path: "/ledger/stock-count", role: "organiser" },
    { path: "/runs", role: "volunteer" },
    { path: "/units", role: "builder" },
    { path: `/units/${demo.demoHeaterId}`, role: "builder" },
    // Issue 16: where organisers archive, restore and edit (drive, drop point, a unit's glazing).
    { path: `/organise/drives/${demo.demoDriveId}`, role: "organiser" },
    { path: `/organise/drop-points/${demo.demoDropPointId}`, role: "organiser" },
    { path: `/units/${demo.demoHeaterId}`, role: "organiser" },
    { path: "/search?q=porch", role: "organiser" },
    { path: "/account", role: "organiser" },
    { path: "/account", role: "volunteer" },
    { path: "/account", role: "builder" },
    // An e-mail's unsubscribe link (opening it changes nothing; the button would).
    { path: `/unsubscribe/${unsubscribeToken(volunteerId, "weeklySummary")}`, role: "public" },
  ];
}

export function emailOf(role: Role): string | null {
  return role === "public" ? null : DEMO[role];
}
