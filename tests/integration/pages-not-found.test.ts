import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ApiClient, signedIn } from "@/tests/support/http";
import { DEMO } from "@/tests/support/env";
import { closeTestDb, testDb } from "@/tests/support/db";
import { demoFixture, type DemoFixture } from "@/tests/support/fixtures";
import { createOwnGroup } from "@/tests/support/own-group";

// A page of another group's record is the not-found page with a real 404
// status (RFC 9110 §15.5.5), not a 200 that only looks like one: the answer
// must say nothing about whether the record exists.
let f: DemoFixture;
let demoRunId: string;
let privateSlug: string;
let elsewhere: ApiClient;
let organiser: ApiClient;

beforeAll(async () => {
  f = await demoFixture();
  const db = testDb();
  demoRunId = (await db("pickup_runs").where({ group_id: f.demoGroupId }).first()).id;
  // A group of its own, so no other test sees a drive turn private.
  const own = await createOwnGroup(db, "private-drive");
  await db("drives").where({ id: own.driveId }).update({ is_public: false });
  privateSlug = own.driveSlug;
  [elsewhere, organiser] = await Promise.all([signedIn(DEMO.otherOrganiser), signedIn(DEMO.organiser)]);
});
afterAll(closeTestDb);

async function page(client: ApiClient, path: string) {
  const res = await client.get(path);
  return { status: res.status, html: await res.text() };
}

describe("pages of another group's records", () => {
  const cases = (): [string, string][] => [
    ["a heater unit", `/units/${f.demoHeaterId}`],
    ["a unit's build sheet", `/units/${f.demoHeaterId}/sheet`],
    ["a pickup run", `/runs/${demoRunId}`],
    ["a drive", `/organise/drives/${f.demoDriveId}`],
    ["a drop point", `/organise/drop-points/${f.demoDropPointId}`],
  ];

  it("answer 404 with the not-found page to an organiser of another group", async () => {
    for (const [what, path] of cases()) {
      const { status, html } = await page(elsewhere, path);
      expect(status, `${what}: ${path}`).toBe(404);
      expect(html).toContain("Nothing here");
      expect(html).not.toContain("Library reading room");
    }
  });

  it("answer 404 for ids that name nothing or are not ids at all", async () => {
    for (const path of ["/units/00000000-0000-4000-8000-000000000000", "/units/not-an-id", "/units/not-an-id/sheet", "/runs/not-an-id", "/runs/00000000-0000-4000-8000-000000000000"]) {
      expect((await page(organiser, path)).status, path).toBe(404);
    }
  });

  it("still show the group's own records", async () => {
    for (const [what, path] of cases()) {
      const { status, html } = await page(organiser, path);
      expect(status, `${what}: ${path}`).toBe(200);
      expect(html).not.toContain("Nothing here");
    }
  });
});

describe("public drive pages", () => {
  it("answer 404 for a drive that does not exist or is not public, and for a sign of another drive's drop point", async () => {
    const anonymous = new ApiClient();
    for (const path of ["/drives/no-such-drive", `/drives/${privateSlug}`, `/drives/${f.demoDriveSlug}/sign/${f.otherDropPointId}`, `/drives/${f.demoDriveSlug}/sign/not-an-id`]) {
      const { status, html } = await page(anonymous, path);
      expect(status, path).toBe(404);
      expect(html).toContain("Nothing here");
    }
    expect((await page(anonymous, `/drives/${f.demoDriveSlug}`)).status).toBe(200);
  });
});
