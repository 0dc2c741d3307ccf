import { describe, expect, it } from "vitest";
import { ApiClient } from "@/tests/support/http";
import { testDb } from "@/tests/support/db";
import { demoFixtureForFile } from "@/tests/support/fixtures";
import { freshGroup, haulAndSort } from "@/tests/support/ledger";
import { DEMO_DROP_POINTS, DEMO_DRIVES } from "@/db/seeds/data/scenario";

const anon = new ApiClient();
const f = demoFixtureForFile();

const PRIVATE_WORDS = /host|phone|email|e-mail|contact|pledge/i;

function keysDeep(value: unknown, out: string[] = []): string[] {
  if (Array.isArray(value)) value.forEach((v) => keysDeep(v, out));
  else if (value && typeof value === "object") {
    for (const [k, v] of Object.entries(value)) {
      out.push(k);
      keysDeep(v, out);
    }
  }
  return out;
}

describe("GET /api/public/drives", () => {
  it("lists the public demo drives in the contract's shape without a session", async () => {
    const res = await anon.json<Array<Record<string, string>>>("GET", "/api/public/drives");
    expect(res.status).toBe(200);
    for (const d of DEMO_DRIVES.filter((d) => d.isPublic)) {
      expect(res.body).toContainEqual({ slug: d.slug, name: d.name, startsOn: d.startsOn, endsOn: d.endsOn });
    }
  });
});

describe("GET /api/public/drives/{slug}", () => {
  it("answers the contract's shape for the demo drive", async () => {
    const res = await anon.json<{ drive: Record<string, unknown>; target: Record<string, number>; progress: Record<string, number> }>("GET", `/api/public/drives/${f.demoDriveSlug}`);
    expect(res.status).toBe(200);
    expect(res.body.drive).toMatchObject({ slug: "larkhollow-winter-2026", name: "Larkhollow Winter Warmth Drive", startsOn: "2026-11-01", endsOn: "2027-01-31" });
    expect(res.body.target.heaters).toBe(4);
    for (const k of ["goodCans", "estimatedUnsorted", "yield", "remaining"]) expect(typeof res.body.progress[k]).toBe("number");
    expect(res.body.progress.remaining).toBe(Math.max(0, res.body.target.cans - res.body.progress.goodCans));
  });

  it("is 404 for an unknown or non-public drive", async () => {
    expect((await anon.json("GET", "/api/public/drives/no-such-drive")).status).toBe(404);
    const db = testDb();
    const [hidden] = await db("drives").insert({ group_id: f.demoGroupId, slug: `hidden-${Date.now()}`, name: "Hidden drive", starts_on: "2026-12-01", ends_on: "2026-12-31", is_public: false }).returning("slug");
    expect((await anon.json("GET", `/api/public/drives/${hidden.slug}`)).status).toBe(404);
    expect((await anon.json("GET", `/api/public/drives/${hidden.slug}/drop-points`)).status).toBe(404);
  });

  it("counts progress and tallies from the ledger", async () => {
    const g = await freshGroup("pubprog");
    const volunteer = await g.client("volunteer");
    await haulAndSort(volunteer, g.driveId, g.dropPointIds[0], 150, { dented: 50 });
    const res = await anon.json<{ target: { cans: number; heaters: number }; progress: Record<string, number> }>("GET", `/api/public/drives/${g.driveSlug}`);
    // Two units of 132 cans plus the 5 % spare rounded up: 264 + ⌈13.2⌉ = 278 (computation 2 of the product brief).
    expect(res.body.target).toEqual({ cans: 278, heaters: 2 });
    expect(res.body.progress).toMatchObject({ goodCans: 150, yield: 0.75, remaining: 128, estimatedUnsorted: 0 });
    const points = await anon.json<Array<{ id: string; tallies: Record<string, number> }>>("GET", `/api/public/drives/${g.driveSlug}/drop-points`);
    const north = points.body.find((p) => p.id === g.dropPointIds[0]);
    expect(north?.tallies).toEqual({ hauls: 1, bags: 2, goodCans: 150, rejectedCans: 50 });
    expect(points.body.find((p) => p.id === g.dropPointIds[1])?.tallies).toEqual({ hauls: 0, bags: 0, goodCans: 0, rejectedCans: 0 });
  });
});

describe("GET /api/public/drives/{slug}/drop-points", () => {
  it("lists every active demo drop point with its position, hours and tallies", async () => {
    const res = await anon.json<Array<{ id: string; name: string; lat: number; lng: number; hours: string; tallies: Record<string, number> }>>(
      "GET",
      `/api/public/drives/${f.demoDriveSlug}/drop-points`,
    );
    expect(res.status).toBe(200);
    const expected = DEMO_DROP_POINTS.filter((p) => p.drive === "winter");
    expect(res.body.map((p) => p.name).sort()).toEqual(expected.map((p) => p.name).sort());
    for (const e of expected) {
      const got = res.body.find((p) => p.name === e.name)!;
      expect(got).toMatchObject({ lat: e.lat, lng: e.lng, hours: e.hours });
      expect(Object.keys(got.tallies).sort()).toEqual(["bags", "goodCans", "hauls", "rejectedCans"]);
    }
  });

  it("leaks no host contact or pledger e-mail, even after a pledge with an address", async () => {
    const pledge = await anon.json("POST", `/api/public/drives/${f.demoDriveSlug}/pledges`, {
      dropPointId: f.demoDropPointId,
      name: "Nell Oakridge",
      email: "nell.oakridge@example.test",
      bags: 2,
      bringOn: "2026-12-05",
    });
    expect(pledge.status).toBe(201);
    for (const path of [`/api/public/drives/${f.demoDriveSlug}`, `/api/public/drives/${f.demoDriveSlug}/drop-points`, "/api/public/drives"]) {
      const res = await anon.get(path);
      const text = await res.text();
      expect(keysDeep(JSON.parse(text)).filter((k) => PRIVATE_WORDS.test(k)), path).toEqual([]);
      for (const p of DEMO_DROP_POINTS) {
        expect(text).not.toContain(p.phone);
        expect(text).not.toContain(p.host);
      }
      expect(text).not.toContain("nell.oakridge@example.test");
      expect(text).not.toContain("Nell Oakridge");
    }
  });

  it("leaves paused drop points out", async () => {
    const g = await freshGroup("paused");
    await testDb()("drop_points").where({ id: g.dropPointIds[1] }).update({ active: false });
    const res = await anon.json<Array<{ id: string }>>("GET", `/api/public/drives/${g.driveSlug}/drop-points`);
    expect(res.body.map((p) => p.id)).toEqual([g.dropPointIds[0]]);
  });
});
