import { beforeAll, describe, expect, it } from "vitest";
import { ApiClient, signedInAll } from "@/tests/support/http";
import { DEMO } from "@/tests/support/env";
import { testDb } from "@/tests/support/db";
import { demoFixtureForFile } from "@/tests/support/fixtures";
import { createOwnGroup } from "@/tests/support/own-group";

// A page of another group's record is the not-found page with a real 404
// status (RFC 9110 §15.5.5), not a 200 that only looks like one: the answer
// must say nothing about whether the record exists.
const f = demoFixtureForFile();
let demoRunId: string;
let demoRunNotes: string;
let privateSlug: string;
let privateName: string;
let elsewhere: ApiClient;
let organiser: ApiClient;

beforeAll(async () => {
  const db = testDb();
  // The seeded run (the first), whose notes only its own page shows.
  const run = await db("pickup_runs").where({ group_id: f.demoGroupId }).orderBy("created_at").first();
  demoRunId = run.id;
  demoRunNotes = run.notes;
  // A group of its own, so no other test sees a drive turn private.
  const own = await createOwnGroup(db, "private-drive");
  await db("drives").where({ id: own.driveId }).update({ is_public: false });
  privateSlug = own.driveSlug;
  privateName = (await db("drives").where({ id: own.driveId }).first()).name;
  [elsewhere, organiser] = await signedInAll(DEMO.otherOrganiser, DEMO.organiser);
});

// The not-found page's words ride in every page's React payload (its boundary
// is part of the tree), so they prove nothing; what does is the status and
// whether the record's own words are in the answer.
async function page(client: ApiClient, path: string) {
  const res = await client.get(path);
  return { status: res.status, html: await res.text() };
}

describe("pages of another group's records", () => {
  // What each page shows of its record (the demo scenario's invented names).
  const cases = (): [string, string, string][] => [
    ["a heater unit", `/units/${f.demoHeaterId}`, "Library reading room"],
    ["a unit's build sheet", `/units/${f.demoHeaterId}/sheet`, "Library reading room"],
    ["a pickup run", `/runs/${demoRunId}`, demoRunNotes],
    ["a drive", `/organise/drives/${f.demoDriveId}`, "Larkhollow Winter Warmth Drive"],
    ["a drop point", `/organise/drop-points/${f.demoDropPointId}`, "Larkhollow Library porch"],
  ];

  it("answer 404 with the not-found page to an organiser of another group", async () => {
    for (const [what, path, shown] of cases()) {
      const { status, html } = await page(elsewhere, path);
      expect(status, `${what}: ${path}`).toBe(404);
      expect(html.includes(shown), `${what} shows "${shown}"`).toBe(false);
    }
  });

  it("answer 404 for ids that name nothing or are not ids at all", async () => {
    for (const path of ["/units/00000000-0000-4000-8000-000000000000", "/units/not-an-id", "/units/not-an-id/sheet", "/runs/not-an-id", "/runs/00000000-0000-4000-8000-000000000000"]) {
      expect((await page(organiser, path)).status, path).toBe(404);
    }
  });

  it("still show the group's own records", async () => {
    expect(demoRunNotes.length).toBeGreaterThan(10);
    for (const [what, path, shown] of cases()) {
      const { status, html } = await page(organiser, path);
      expect(status, `${what}: ${path}`).toBe(200);
      expect(html.includes(shown), `${what} shows "${shown}"`).toBe(true);
    }
  });
});

describe("public drive pages", () => {
  it("answer 404 for a drive that does not exist or is not public, and for a sign of another drive's drop point", async () => {
    const anonymous = new ApiClient();
    const otherPoint = (await testDb()("drop_points").where({ id: f.otherDropPointId }).first()).name as string;
    for (const [path, hidden] of [["/drives/no-such-drive", ""], [`/drives/${privateSlug}`, privateName], [`/drives/${f.demoDriveSlug}/sign/${f.otherDropPointId}`, otherPoint], [`/drives/${f.demoDriveSlug}/sign/not-an-id`, ""]] as const) {
      const { status, html } = await page(anonymous, path);
      expect(status, path).toBe(404);
      if (hidden) expect(html.includes(hidden), `${path} shows "${hidden}"`).toBe(false);
    }
    const own = await page(anonymous, `/drives/${f.demoDriveSlug}`);
    expect(own.status).toBe(200);
    expect(own.html).toContain("Larkhollow Winter Warmth Drive");
  });
});
