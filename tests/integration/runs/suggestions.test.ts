import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signedIn, type ApiClient } from "@/tests/support/http";
import { DEMO } from "@/tests/support/env";
import { closeTestDb, testDb } from "@/tests/support/db";
import { demoFixture } from "@/tests/support/fixtures";

interface Suggestion {
  id: string;
  reportedFill: number | null;
  reportedFull: boolean;
  daysSinceHaul: number | null;
  suggested: boolean;
}

// Works on the ended harvest drive, whose own drop points are inactive, so the
// two bins made here are the only candidates and no other suite touches them.
let organiser: ApiClient;
let driveId: string;
let groupId: string;
const made: string[] = [];

beforeAll(async () => {
  organiser = await signedIn(DEMO.organiser);
  const f = await demoFixture();
  groupId = f.demoGroupId;
  driveId = (await testDb()("drives").where({ slug: "larkhollow-harvest-2026" }).first()).id;
  for (const name of ["Test bin A (runs suite)", "Test bin B (runs suite)"]) {
    const [row] = await testDb()("drop_points")
      .insert({ group_id: groupId, drive_id: driveId, name, lat: 47.2, lng: -8.0, capacity_bags: 4, active: true })
      .returning("id");
    made.push(row.id);
  }
});
afterAll(async () => {
  await testDb()("fill_reports").whereIn("drop_point_id", made).delete();
  await testDb()("drop_points").whereIn("id", made).delete();
  await closeTestDb();
});

const suggestions = async () =>
  (await organiser.json<Suggestion[]>("GET", `/api/runs/suggestions?driveId=${driveId}`)).body;

describe("suggested stops", () => {
  it("puts a bin reported three-quarters full first, and drops it back when a newer report says half", async () => {
    const [a, b] = made as [string, string];
    await testDb()("fill_reports").insert({ group_id: groupId, drop_point_id: b, level: 75, created_at: new Date(Date.now() - 60_000) });
    let list = await suggestions();
    expect(list.map((s) => s.id)).toEqual([b, a]);
    expect(list[0]).toMatchObject({ reportedFill: 0.75, reportedFull: true, suggested: true });
    expect(list[1]).toMatchObject({ reportedFill: null, reportedFull: false, daysSinceHaul: null });

    await testDb()("fill_reports").insert({ group_id: groupId, drop_point_id: b, level: 50 });
    list = await suggestions();
    expect(list.find((s) => s.id === b)).toMatchObject({ reportedFill: 0.5, reportedFull: false });
  });
});
