import { beforeAll, describe, expect, it } from "vitest";
import { signedIn, type ApiClient } from "@/tests/support/http";
import { DEMO } from "@/tests/support/env";
import { testDb } from "@/tests/support/db";
import { demoFixtureForFile } from "@/tests/support/fixtures";

type Err = { error: { code: string; message: string; fields?: Record<string, string> } };

let organiser: ApiClient;
const f = demoFixtureForFile();
const tag = Date.now().toString(36);

beforeAll(async () => {
  organiser = await signedIn(DEMO.organiser);
});

const drive = (over: Record<string, unknown> = {}) => ({
  name: "Larkhollow Spring Tidy Drive",
  slug: `spring-${tag}`,
  startsOn: "2027-03-01",
  endsOn: "2027-04-30",
  isPublic: true,
  description: "Cans for the boathouse heater.",
  wanted: "",
  ...over,
});

const point = (over: Record<string, unknown> = {}) => ({
  name: "Fernside bakery",
  address: "12 Fernside Lane",
  lat: 47.2061,
  lng: -7.9958,
  hours: "Tue–Sat 7:00–14:00",
  hostName: "Orla Pennick",
  hostPhone: "+00 555 0190",
  hostEmail: "orla@example.test",
  capacityBags: 5,
  active: true,
  ...over,
});

describe("organiser drive and drop point endpoints", () => {
  it("creates a drive, adds a drop point and edits both", async () => {
    const created = await organiser.json<{ id: string; slug: string }>("POST", "/api/drives", drive());
    expect(created.status).toBe(201);
    const dp = await organiser.json<{ id: string; hostEmail: string }>("POST", `/api/drives/${created.body.id}/drop-points`, point());
    expect(dp.status).toBe(201);
    expect(dp.body.hostEmail).toBe("orla@example.test");
    const moved = await organiser.json<{ lat: number; lng: number; name: string }>("PATCH", `/api/drop-points/${dp.body.id}`, { lat: 47.2065, lng: -7.9951 });
    expect(moved.body).toMatchObject({ lat: 47.2065, lng: -7.9951, name: "Fernside bakery" });
    const edited = await organiser.json<{ name: string; isPublic: boolean }>("PUT", `/api/drives/${created.body.id}`, drive({ name: "Spring Tidy Drive", isPublic: false }));
    expect(edited.body).toMatchObject({ name: "Spring Tidy Drive", isPublic: false });
    // Not public any more: the public page and endpoints are gone.
    expect((await organiser.json("GET", `/api/public/drives/${created.body.slug}`)).status).toBe(404);
  });

  it("refuses a slug that is taken, with a message on the field, and writes nothing", async () => {
    const db = testDb();
    const before = await db("drives").count<{ count: string }[]>("* as count");
    const res = await organiser.json<Err>("POST", "/api/drives", drive({ slug: f.otherDriveSlug }));
    expect(res.status).toBe(422);
    expect(res.body.error.fields?.slug).toMatch(/taken/i);
    const after = await db("drives").count<{ count: string }[]>("* as count");
    expect(after[0].count).toBe(before[0].count);
  });

  it("refuses reversed dates and an impossible date", async () => {
    const res = await organiser.json<Err>("POST", "/api/drives", drive({ slug: `rev-${tag}`, startsOn: "2027-05-01", endsOn: "2027-04-01" }));
    expect(res.status).toBe(422);
    expect(res.body.error.fields?.endsOn).toMatch(/on or after the start/i);
    const bad = await organiser.json<Err>("POST", "/api/drives", drive({ slug: `feb-${tag}`, startsOn: "2027-02-30" }));
    expect(bad.status).toBe(422);
    expect(bad.body.error.fields?.startsOn).toMatch(/does not exist/i);
    expect(await testDb()("drives").whereIn("slug", [`rev-${tag}`, `feb-${tag}`]).first()).toBeUndefined();
  });

  it("refuses coordinates off the globe on create and on move, and writes nothing", async () => {
    const db = testDb();
    const before = (await db("drop_points").where({ drive_id: f.demoDriveId }).count<{ count: string }[]>("* as count"))[0].count;
    const res = await organiser.json<Err>("POST", `/api/drives/${f.demoDriveId}/drop-points`, point({ lat: 91, lng: -181 }));
    expect(res.status).toBe(422);
    expect(res.body.error.fields?.lat).toMatch(/between −90 and 90/);
    expect(res.body.error.fields?.lng).toMatch(/between −180 and 180/);
    const move = await organiser.json<Err>("PATCH", `/api/drop-points/${f.demoDropPointId}`, { lat: -95 });
    expect(move.status).toBe(422);
    expect((await db("drop_points").where({ id: f.demoDropPointId }).first()).lat).toBe(47.2012);
    const after = (await db("drop_points").where({ drive_id: f.demoDriveId }).count<{ count: string }[]>("* as count"))[0].count;
    expect(after).toBe(before);
  });

  it("keeps another group's drive and drop point out of reach (404)", async () => {
    expect((await organiser.json("PUT", `/api/drives/${f.otherDriveId}`, drive({ slug: `x-${tag}` }))).status).toBe(404);
    expect((await organiser.json("PATCH", `/api/drop-points/${f.otherDropPointId}`, { name: "Taken over" })).status).toBe(404);
    expect((await testDb()("drop_points").where({ id: f.otherDropPointId }).first()).name).toBe("Boatshed yard");
  });
});

describe("drop point photo uploads", () => {
  // The upload route checks the declared file before handing out an upload URL.
  const start = (files: unknown[]) =>
    organiser.json<{ message?: string; error?: unknown }>("POST", "/api/uploadthing?actionType=upload&slug=dropPointPhoto", {
      files,
      input: { dropPointId: f.demoDropPointId },
    });

  it("refuses an oversized photo and a file that is not an image, writing no file row", async () => {
    const db = testDb();
    const count = async () => (await db("files").count<{ count: string }[]>("* as count"))[0].count;
    const before = await count();
    const big = await start([{ name: "porch.jpg", size: 5 * 1024 * 1024, type: "image/jpeg", lastModified: 0 }]);
    expect(big.status).toBe(400);
    expect(JSON.stringify(big.body)).toMatch(/size|large/i);
    const pdf = await start([{ name: "notes.pdf", size: 1000, type: "application/pdf", lastModified: 0 }]);
    expect(pdf.status).toBe(400);
    expect(JSON.stringify(pdf.body)).toMatch(/type|invalid/i);
    expect(await count()).toBe(before);
  });
});
