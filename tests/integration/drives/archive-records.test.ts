import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { testDb } from "@/tests/support/db";
import { addDrive, freshGroupForFile, haulAndSort } from "@/tests/support/ledger";
import type { ApiClient } from "@/tests/support/http";

// Issue 16, "archive, never lose": drives, drop points, photos, pledges and fill
// reports leave the lists and the public pages when archived, are listed under
// "archived", come back when restored, and can be deleted only when no ledger
// line refers to them, with a confirmation. The ledger (and its CSV) never loses a line.
const g = freshGroupForFile("records");
const other = freshGroupForFile("records-other");
let org: ApiClient;
let vol: ApiClient;
let bld: ApiClient;
let attacker: ApiClient;

type Listed = { id: string }[];
type Archived = { dropPoints: Listed; pledges: Listed; fillReports: Listed; photos: Listed };
type PublicPoint = { id: string; photos: string[]; fill: { level: number } | null };

beforeAll(async () => {
  [org, vol, bld, attacker] = await Promise.all([g.client("organiser"), g.client("volunteer"), g.client("builder"), other.client("organiser")]);
});

const post = (c: ApiClient, path: string, body: unknown = {}, key = randomUUID()) =>
  c.json<{ error?: { code: string; message: string } }>("POST", path, body, { "Idempotency-Key": key });
const ids = (list: Listed) => list.map((r) => r.id);
const orgPoints = async (q = "") => ids((await org.json<Listed>("GET", `/api/drives/${g.driveId}/drop-points${q}`)).body);
const publicPoints = async () => (await org.json<PublicPoint[]>("GET", `/api/public/drives/${g.driveSlug}/drop-points`)).body;
const archived = async () => (await org.json<Archived>("GET", `/api/drives/${g.driveId}/archived`)).body;
const ledgerLines = async () => Number((await testDb()("ledger_lines").where({ group_id: g.groupId }).count({ n: "*" }).first())?.n);
const csv = async () => (await (await org.get(`/api/ledger/export?driveId=${g.driveId}`)).text()).trim().split(/\r?\n/);

async function pledgeOn(pointId: string) {
  const [row] = await testDb()("pledges").insert({ group_id: g.groupId, drive_id: g.driveId, drop_point_id: pointId, name: "Records test donor", bags: 2, bring_on: "2026-12-20" }).returning("id");
  return row.id as string;
}
/** Rows written straight to the database are read through HTTP next: an empty PATCH (a 200 write that changes nothing) clears the servers' short read cache. */
const forgetReads = async (pointId: string) => expect((await org.json("PATCH", `/api/drop-points/${pointId}`, {})).status).toBe(200);
async function fillReportOn(pointId: string, level = 100) {
  const [row] = await testDb()("fill_reports").insert({ group_id: g.groupId, drop_point_id: pointId, level, note: "records test" }).returning("id");
  await forgetReads(pointId);
  return row.id as string;
}
async function photoOf(pointId: string) {
  const key = `records-test-${randomUUID()}`;
  const [row] = await testDb()("files")
    .insert({ group_id: g.groupId, key, url: `http://127.0.0.1/f/${key}`, name: "bin.png", size: 10, mime: "image/png", purpose: "drop-point-photo", subject_id: pointId })
    .returning("id");
  await forgetReads(pointId);
  return { id: row.id as string, url: `http://127.0.0.1/f/${key}` };
}

describe("archiving and restoring a drop point", () => {
  it("hides it from the organiser's list and the public map, lists it as archived, and restores it", async () => {
    const [a, b] = g.dropPointIds;
    expect(await orgPoints()).toEqual(expect.arrayContaining([a, b]));
    expect((await post(org, `/api/drop-points/${a}/archive`)).status).toBe(200);

    expect(await orgPoints()).not.toContain(a);
    expect(await orgPoints()).toContain(b);
    expect(await orgPoints("?archived=1")).toEqual([a]);
    expect((await org.json("GET", `/api/drives/${g.driveId}/drop-points?archived=yes`)).status).toBe(422);
    expect((await publicPoints()).map((p) => p.id)).not.toContain(a);
    expect(ids((await archived()).dropPoints)).toEqual([a]);
    // The public cannot pledge at an archived drop point (refused like any drop point not open).
    expect((await org.json("POST", `/api/public/drives/${g.driveSlug}/pledges`, { dropPointId: a, name: "", bags: 1, bringOn: "2026-12-20" })).status).toBe(422);

    // Nor is it offered to a pickup run, or taken into one.
    const suggested = await org.json<{ id: string }[]>("GET", `/api/runs/suggestions?driveId=${g.driveId}`);
    expect(suggested.status).toBe(200);
    expect(ids(suggested.body)).not.toContain(a);
    expect(ids(suggested.body)).toContain(b);
    const volunteerId = (await testDb()("users").where({ email: g.emails.volunteer }).first()).id;
    const run = { driveId: g.driveId, plannedOn: "2026-12-20", start: { lat: 52, lng: -1.6 }, assigneeId: volunteerId };
    expect((await org.json("POST", "/api/runs", { ...run, dropPointIds: [a] })).status).toBe(422);
    expect((await org.json("POST", "/api/runs", { ...run, dropPointIds: [b] })).status).toBe(201);

    // State rules: archiving twice or restoring an active one is 409.
    expect((await post(org, `/api/drop-points/${a}/archive`)).status).toBe(409);
    expect((await post(org, `/api/drop-points/${b}/restore`)).status).toBe(409);
    expect((await post(org, `/api/drop-points/${a}/restore`)).status).toBe(200);
    expect(await orgPoints()).toContain(a);
    expect((await publicPoints()).map((p) => p.id)).toContain(a);
  });

  it("keeps the first answer under an Idempotency-Key: a repeat archives nothing twice", async () => {
    const b = g.dropPointIds[1];
    const key = randomUUID();
    const first = await post(org, `/api/drop-points/${b}/archive`, {}, key);
    const again = await post(org, `/api/drop-points/${b}/archive`, {}, key);
    expect([first.status, again.status]).toEqual([200, 200]);
    expect(again.body).toEqual(first.body);
    expect((await post(org, `/api/drop-points/${b}/archive`, { sure: true }, key)).status).toBe(409);
    expect((await post(org, `/api/drop-points/${b}/restore`)).status).toBe(200);
  });
});

describe("deleting only what no ledger line refers to", () => {
  it("refuses (409) a drop point with a haul, needs the confirmation, and deletes an unused one", async () => {
    const used = g.dropPointIds[0];
    await haulAndSort(vol, g.driveId, used, 40);
    const before = { lines: await ledgerLines(), csv: await csv() };

    const refused = await post(org, `/api/drop-points/${used}/delete`, { confirm: true });
    expect(refused.status).toBe(409);
    expect(refused.body.error?.message).toMatch(/ledger/);
    expect(await testDb()("drop_points").where({ id: used }).first("id")).toBeTruthy();

    const [unused] = await testDb()("drop_points").insert({ group_id: g.groupId, drive_id: g.driveId, name: "Throwaway test bin", lat: 47.25, lng: -8 }).returning("id");
    const photo = await photoOf(unused.id);
    // No confirmation, a wrong one, or a stray field: 422, nothing deleted.
    for (const body of [{}, { confirm: false }, { confirm: "yes" }, { confirm: true, also: 1 }]) {
      expect((await post(org, `/api/drop-points/${unused.id}/delete`, body)).status).toBe(422);
    }
    expect(await testDb()("drop_points").where({ id: unused.id }).first("id")).toBeTruthy();
    expect((await post(org, `/api/drop-points/${unused.id}/delete`, { confirm: true })).status).toBe(200);
    expect(await testDb()("drop_points").where({ id: unused.id }).first("id")).toBeUndefined();
    // Its photos go with it.
    expect(await testDb()("files").where({ id: photo.id }).first("id")).toBeUndefined();
    expect((await post(org, `/api/drop-points/${unused.id}/delete`, { confirm: true })).status).toBe(404);

    // Nothing logged disappeared.
    expect(await ledgerLines()).toBe(before.lines);
    expect(await csv()).toEqual(before.csv);
  });

  it("refuses to delete a drive with ledger lines, and deletes an unused drive once confirmed", async () => {
    expect((await post(org, `/api/drives/${g.driveId}/delete`, { confirm: true })).status).toBe(409);
    const spare = await addDrive(g, { name: "Test drive made by mistake", startsOn: "2027-01-01", endsOn: "2027-01-31" });
    expect((await post(org, `/api/drives/${spare}/delete`, {})).status).toBe(422);
    expect((await post(org, `/api/drives/${spare}/delete`, { confirm: true })).status).toBe(200);
    expect(await testDb()("drives").where({ id: spare }).first("id")).toBeUndefined();
    expect(await testDb()("drop_points").where({ drive_id: spare }).first("id")).toBeUndefined();
  });
});

describe("archiving a drive", () => {
  it("takes it off the group's list and the public pages until restored", async () => {
    const listed = async (q = "") => ids((await org.json<Listed>("GET", `/api/drives${q}`)).body);
    const publicList = async () => (await org.json<{ slug: string }[]>("GET", "/api/public/drives")).body.map((d) => d.slug);
    expect(await listed()).toContain(g.driveId);
    expect((await post(org, `/api/drives/${g.driveId}/archive`)).status).toBe(200);
    expect(await listed()).not.toContain(g.driveId);
    expect(await listed("?archived=1")).toEqual([g.driveId]);
    expect(await publicList()).not.toContain(g.driveSlug);
    expect((await org.json("GET", `/api/public/drives/${g.driveSlug}`)).status).toBe(404);
    expect((await org.json("GET", `/api/public/drives/${g.driveSlug}/drop-points`)).status).toBe(404);
    // The organiser still reaches it by id, to restore it.
    expect((await org.json("GET", `/api/drives/${g.driveId}`)).status).toBe(200);
    expect((await post(org, `/api/drives/${g.driveId}/restore`)).status).toBe(200);
    expect(await publicList()).toContain(g.driveSlug);
    expect((await org.json("GET", `/api/public/drives/${g.driveSlug}`)).status).toBe(200);
  });
});

describe("pledges, fill reports and photos", () => {
  it("archives a pledge out of the drive's list, restores it, and deletes it once confirmed", async () => {
    const pledge = await pledgeOn(g.dropPointIds[1]);
    expect((await post(org, `/api/pledges/${pledge}/archive`)).status).toBe(200);
    expect(ids((await archived()).pledges)).toEqual([pledge]);
    expect((await post(org, `/api/pledges/${pledge}/restore`)).status).toBe(200);
    expect(ids((await archived()).pledges)).toEqual([]);
    expect((await post(org, `/api/pledges/${pledge}/delete`, { confirm: true })).status).toBe(200);
    expect(await testDb()("pledges").where({ id: pledge }).first("id")).toBeUndefined();
  });

  it("an archived fill report no longer makes the public bin full", async () => {
    const point = g.dropPointIds[1];
    const report = await fillReportOn(point, 100);
    const fillOf = async () => (await publicPoints()).find((p) => p.id === point)?.fill?.level ?? null;
    expect(await fillOf()).toBe(100);
    expect((await post(org, `/api/fill-reports/${report}/archive`)).status).toBe(200);
    expect(await fillOf()).toBeNull();
    expect(ids((await archived()).fillReports)).toEqual([report]);
    expect((await post(org, `/api/fill-reports/${report}/restore`)).status).toBe(200);
    expect(await fillOf()).toBe(100);
    // The report's photo goes with it (a file row pointing at nothing would stay otherwise).
    const key = `records-fill-${randomUUID()}`;
    const [file] = await testDb()("files")
      .insert({ group_id: g.groupId, key, url: `http://127.0.0.1/f/${key}`, name: "bin.png", size: 10, mime: "image/png", purpose: "fill-report-photo", subject_id: report })
      .returning("id");
    await testDb()("fill_reports").where({ id: report }).update({ photo_file_id: file.id });
    expect((await post(org, `/api/fill-reports/${report}/delete`, { confirm: true })).status).toBe(200);
    expect(await fillOf()).toBeNull();
    expect(await testDb()("files").where({ id: file.id }).first("id")).toBeUndefined();
  });

  it("an archived photo leaves the public map, and comes back when restored", async () => {
    const point = g.dropPointIds[1];
    const photo = await photoOf(point);
    const photos = async () => (await publicPoints()).find((p) => p.id === point)?.photos ?? [];
    expect(await photos()).toContain(photo.url);
    expect((await post(org, `/api/photos/${photo.id}/archive`)).status).toBe(200);
    expect(await photos()).not.toContain(photo.url);
    expect(ids((await archived()).photos)).toEqual([photo.id]);
    expect((await post(org, `/api/photos/${photo.id}/restore`)).status).toBe(200);
    expect(await photos()).toContain(photo.url);
    expect((await post(org, `/api/photos/${photo.id}/delete`, { confirm: true })).status).toBe(200);
    expect(await photos()).not.toContain(photo.url);
  });
});

describe("attackers", () => {
  it("another group's organiser gets 404 on every record and action, and changes nothing", async () => {
    const point = g.dropPointIds[1];
    const targets = [
      ["drives", g.driveId],
      ["drop-points", point],
      ["photos", (await photoOf(point)).id],
      ["pledges", await pledgeOn(point)],
      ["fill-reports", await fillReportOn(point, 25)],
    ];
    for (const [folder, id] of targets) {
      for (const [action, body] of [["archive", {}], ["restore", {}], ["delete", { confirm: true }]] as const) {
        const r = await post(attacker, `/api/${folder}/${id}/${action}`, body);
        expect(r.status, `${action} ${folder}`).toBe(404);
      }
    }
    expect((await attacker.json("GET", `/api/drives/${g.driveId}/archived`)).status).toBe(404);
    const db = testDb();
    for (const [table, id] of [["drives", g.driveId], ["drop_points", point], ["files", targets[2][1]], ["pledges", targets[3][1]], ["fill_reports", targets[4][1]]]) {
      expect(await db(table).where({ id }).first("archived_at"), table).toEqual({ archived_at: null });
    }
  });

  it("a volunteer and a builder of the group are refused (403) and change nothing", async () => {
    const point = g.dropPointIds[1];
    for (const c of [vol, bld]) {
      expect((await post(c, `/api/drop-points/${point}/archive`)).status).toBe(403);
      expect((await post(c, `/api/drop-points/${point}/delete`, { confirm: true })).status).toBe(403);
    }
    expect(await testDb()("drop_points").where({ id: point }).first("archived_at")).toEqual({ archived_at: null });
  });
});
