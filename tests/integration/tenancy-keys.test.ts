import type { Knex } from "knex";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "@/tests/support/db";
import { createOwnGroup, type OwnGroup } from "@/tests/support/own-group";

// Composite keys (migration 20261204020000): a child row's group_id must be
// its parent's, so the database itself refuses a row that mixes two groups.
let a: OwnGroup;
let b: OwnGroup;
beforeAll(async () => {
  a = await createOwnGroup(testDb(), "tenancy-a");
  b = await createOwnGroup(testDb(), "tenancy-b");
});
afterAll(closeTestDb);

/** The SQLSTATE of a refused write, or "written" (the write is rolled back either way). */
async function outcome(write: (trx: Knex.Transaction) => Promise<unknown>): Promise<string> {
  try {
    await testDb().transaction(async (trx) => {
      await write(trx);
      throw new Error("rollback");
    });
  } catch (error) {
    const e = error as { code?: string; message?: string };
    return e.code ?? (e.message === "rollback" ? "written" : String(e.message));
  }
  return "written";
}

describe("a child of another group's parent", () => {
  it("is refused for a drop point on another group's drive, and allowed on its own", async () => {
    const point = (groupId: string) => ({ group_id: groupId, drive_id: b.driveId, name: "stray porch", lat: 52, lng: -1.6, hours: "Daily" });
    expect(await outcome((trx) => trx("drop_points").insert(point(a.groupId)))).toBe("23503");
    expect(await outcome((trx) => trx("drop_points").insert(point(b.groupId)))).toBe("written");
    expect(await testDb()("drop_points").where({ name: "stray porch" }).count({ n: "*" }).first()).toMatchObject({ n: "0" });
  });

  it("is refused for a movement, a running total and a heater unit that mix groups", async () => {
    const user = await testDb()("memberships").where({ group_id: a.groupId, role: "organiser" }).first("user_id");
    expect(await outcome((trx) => trx("movements").insert({ group_id: a.groupId, drive_id: b.driveId, kind: "haul", recorded_by: user.user_id }))).toBe("23503");
    expect(await outcome((trx) => trx("stage_balances").insert({ group_id: a.groupId, drive_id: a.driveId, drop_point_id: b.dropPointId, stage: "hauled" }))).toBe("23503");
    expect(await outcome((trx) => trx("heater_units").where({ id: a.heaterId }).update({ drive_id: b.driveId }))).toBe("23503");
  });
});
