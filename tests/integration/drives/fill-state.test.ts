import { afterAll, describe, expect, it } from "vitest";
import { ApiClient } from "@/tests/support/http";
import { closeTestDb, testDb } from "@/tests/support/db";
import { freshGroup, type FreshGroup } from "@/tests/support/ledger";

// Bin fill as state (issue 13): a drop point's fill is its newest report after
// its last haul or the organiser's clear; the dashboard lists every full bin once.
const anon = new ApiClient();
afterAll(closeTestDb);

const report = (g: FreshGroup, dp: string, level: number) => anon.json("POST", `/api/public/drives/${g.driveSlug}/drop-points/${dp}/fill-reports`, { level });
const publicFill = async (g: FreshGroup) => {
  const res = await anon.json<{ id: string; fill: { level: number; reportedAt: string } | null; fillLevel: number | null }[]>("GET", `/api/public/drives/${g.driveSlug}/drop-points`);
  return new Map(res.body.map((p) => [p.id, p]));
};
async function dashboardBins(g: FreshGroup): Promise<string[]> {
  const html = await (await (await g.client("organiser")).get("/dashboard")).text();
  return [...html.matchAll(/data-testid="full-bin"[^>]*>.*?<strong>([^<]+)<\/strong>/g)].map((m) => m[1]);
}

describe("bin fill as state", () => {
  it("a haul from the bin clears it on the map's JSON and the dashboard; undoing the haul brings it back", async () => {
    const g = await freshGroup("fillstate");
    expect((await report(g, g.dropPointIds[0], 100)).status).toBe(201);
    let points = await publicFill(g);
    expect(points.get(g.dropPointIds[0])!.fill).toMatchObject({ level: 100 });
    expect(points.get(g.dropPointIds[1])!.fill).toBeNull();
    expect(await dashboardBins(g)).toEqual(["North porch"]);

    const vol = await g.client("volunteer");
    const haul = await vol.json<{ movementId: string }>("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[0], bags: 3 });
    expect(haul.status).toBe(201);
    points = await publicFill(g);
    expect(points.get(g.dropPointIds[0])!.fill).toBeNull();
    // The last report stays readable as history.
    expect(points.get(g.dropPointIds[0])!.fillLevel).toBe(100);
    expect(await dashboardBins(g)).toEqual([]);

    expect((await vol.json("POST", `/api/movements/${haul.body.movementId}/reversal`)).status).toBe(201);
    expect((await publicFill(g)).get(g.dropPointIds[0])!.fill).toMatchObject({ level: 100 });
  });

  it("lists every full bin once, however many reports, not the last five reports", async () => {
    const g = await freshGroup("fillsix");
    const db = testDb();
    const extra = ["Chapel steps", "Mill yard", "Quay shed", "Ferry shelter"];
    const ids = [...g.dropPointIds];
    for (const [i, name] of extra.entries()) {
      const [p] = await db("drop_points").insert({ group_id: g.groupId, drive_id: g.driveId, name, lat: 47.25 + i / 100, lng: -8.01 }).returning("id");
      ids.push(p.id);
    }
    for (const id of ids) await report(g, id, 75);
    for (let i = 0; i < 3; i++) await report(g, ids[0], 100);
    const bins = await dashboardBins(g);
    expect(bins).toHaveLength(6);
    expect(new Set(bins)).toEqual(new Set(["North porch", "South gate", ...extra]));
  });

  it("an organiser clears a bin; a report newer than the one they saw stays; others cannot clear", async () => {
    const g = await freshGroup("fillclear");
    const dp = g.dropPointIds[0];
    await report(g, dp, 100);
    const seen = (await publicFill(g)).get(dp)!.fill!.reportedAt;
    await report(g, dp, 75);
    const org = await g.client("organiser");
    const stale = await org.json("POST", `/api/drop-points/${dp}/fill-clear`, { asOf: seen });
    expect(stale.status).toBe(200);
    expect((await publicFill(g)).get(dp)!.fill).toMatchObject({ level: 75 });

    expect((await org.json("POST", `/api/drop-points/${dp}/fill-clear`)).status).toBe(200);
    expect((await publicFill(g)).get(dp)!.fill).toBeNull();
    expect(await dashboardBins(g)).toEqual([]);

    expect((await (await g.client("volunteer")).json("POST", `/api/drop-points/${dp}/fill-clear`)).status).toBe(403);
    const other = await freshGroup("fillclear-other");
    expect((await (await other.client("organiser")).json("POST", `/api/drop-points/${dp}/fill-clear`)).status).toBe(404);
    expect((await org.json("POST", `/api/drop-points/${dp}/fill-clear`, { asOf: "yesterday" })).status).toBe(422);
  });
});
