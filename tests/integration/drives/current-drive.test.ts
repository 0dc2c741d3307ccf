import { beforeAll, describe, expect, it } from "vitest";
import type { ApiClient } from "@/tests/support/http";
import { testDb } from "@/tests/support/db";
import { demoFixtureForFile } from "@/tests/support/fixtures";
import { addDrive, dayFromToday, freshGroup, type FreshGroup } from "@/tests/support/ledger";

// A group with a drive running today and a newer one that starts in three
// months: every page where cans are entered opens on the running one until the
// person chooses another; the choice is kept per person (PUT /api/me/drive).
let g: FreshGroup;
const f = demoFixtureForFile();
let futureId: string;
let volunteer: ApiClient;
let organiser: ApiClient;
const runningName = "Running hall drive";
const futureName = "Next season drive";
const futureStart = dayFromToday(90);

beforeAll(async () => {
  const db = testDb();
  g = await freshGroup("current-drive");
  await db("drives").where({ id: g.driveId }).update({ name: runningName, starts_on: dayFromToday(-20), ends_on: dayFromToday(40) });
  // Newer in every way the old pages sorted by: starts and ends later, created later, has a drop point.
  futureId = await addDrive(g, { name: futureName, startsOn: futureStart, endsOn: dayFromToday(180) });
  volunteer = await g.client("volunteer");
  organiser = await g.client("organiser");
});

async function html(client: ApiClient, path: string): Promise<string> {
  const res = await client.get(path);
  expect(res.status, path).toBe(200);
  return res.text();
}

/** The drive name in the banner beside the form (the real element, not the page's data payload). */
function bannerName(page: string): string | null {
  return /data-testid="current-drive-name"[^>]*>([^<]*)</.exec(page)?.[1] ?? null;
}

/** The value of the option the server rendered as selected in `<select id=…>`. */
function selected(page: string, id: string): string | null {
  const select = new RegExp(`<select[^>]*id="${id}"[^>]*>([\\s\\S]*?)</select>`).exec(page)?.[1];
  return select ? (/<option[^>]*value="([^"]+)"[^>]*selected=""/.exec(select)?.[1] ?? null) : null;
}

const remembered = async (email: string) =>
  (await testDb()("memberships as m").join("users as u", "u.id", "m.user_id").where({ "u.email": email, "m.group_id": g.groupId }).first("m.current_drive_id")).current_drive_id as string | null;

describe("the drive a page opens on", () => {
  it("is the running drive, not the newer future one, on the log, ledger, stock count and run planner", async () => {
    const log = await html(volunteer, "/log");
    expect(selected(log, "log-drive")).toBe(g.driveId);
    expect(bannerName(log)).toBe(runningName);
    expect(log).not.toContain('data-testid="current-drive-warning"');
    for (const path of ["/ledger", "/ledger/stock-count", "/runs/new"]) expect(bannerName(await html(organiser, path)), path).toBe(runningName);
    expect(selected(await html(organiser, "/runs/new"), "drive")).toBe(g.driveId);
  });

  it("is the one a volunteer chose, on later loads, with a plain warning that it has not started", async () => {
    const put = await volunteer.json<{ driveId: string }>("PUT", "/api/me/drive", { driveId: futureId });
    expect(put.status).toBe(200);
    expect(put.body).toEqual({ driveId: futureId });
    expect(await remembered(g.emails.volunteer)).toBe(futureId);
    const log = await html(volunteer, "/log");
    expect(selected(log, "log-drive")).toBe(futureId);
    expect(bannerName(log)).toBe(futureName);
    const [y, m, d] = futureStart.split("-").map(Number);
    const long = new Date(Date.UTC(y, m - 1, d)).toLocaleDateString("en-GB", { day: "numeric", month: "long", year: "numeric", timeZone: "UTC" });
    expect(log).toContain(`This drive starts on ${long}.`);
    // Per person: the organiser's pages still open on the running drive.
    expect(bannerName(await html(organiser, "/ledger"))).toBe(runningName);
  });

  it("gives way to a drive named in the address, and the ledger follows the organiser's choice", async () => {
    expect(selected(await html(volunteer, `/log?dropPoint=${g.dropPointIds[0]}`), "log-drive")).toBe(g.driveId);
    expect((await organiser.json("PUT", "/api/me/drive", { driveId: futureId })).status).toBe(200);
    expect(bannerName(await html(organiser, "/ledger"))).toBe(futureName);
    expect(bannerName(await html(organiser, "/ledger/stock-count"))).toBe(futureName);
    expect(selected(await html(organiser, "/runs/new"), "drive")).toBe(futureId);
    expect(bannerName(await html(organiser, `/ledger?driveId=${g.driveId}`))).toBe(runningName);
    expect(bannerName(await html(organiser, `/ledger/stock-count?drive=${g.driveId}`))).toBe(runningName);
  });

  it("refuses another group's drive with 404 and a malformed one with 422, changing nothing", async () => {
    const before = await remembered(g.emails.volunteer);
    const other = await volunteer.json<{ error: { code: string } }>("PUT", "/api/me/drive", { driveId: f.demoDriveId });
    expect(other.status).toBe(404);
    expect(other.body.error.code).toBe("not_found");
    const bad = await volunteer.json<{ error: { fields: Record<string, string> } }>("PUT", "/api/me/drive", { driveId: "next-season" });
    expect(bad.status).toBe(422);
    expect(bad.body.error.fields.driveId).toMatch(/drive/);
    expect(await remembered(g.emails.volunteer)).toBe(before);
    expect((await g.client("builder").then((b) => b.json("PUT", "/api/me/drive", { driveId: g.driveId }))).status).toBe(200);
  });

  it("falls back to the running drive when the remembered one is deleted or not the group's", async () => {
    const db = testDb();
    const spare = await addDrive(g, { name: "Short-lived drive", startsOn: dayFromToday(200), endsOn: dayFromToday(210), dropPoint: false });
    expect((await volunteer.json("PUT", "/api/me/drive", { driveId: spare })).status).toBe(200);
    expect(bannerName(await html(volunteer, "/log"))).toBe("Short-lived drive");
    await db("drives").where({ id: spare }).delete();
    expect(await remembered(g.emails.volunteer)).toBeNull();
    expect(bannerName(await html(volunteer, "/log"))).toBe(runningName);
    // A stored id that is some other group's drive (never written by the API) is ignored as well.
    await db("memberships").where({ group_id: g.groupId }).whereIn("user_id", db("users").select("id").where({ email: g.emails.volunteer })).update({ current_drive_id: f.demoDriveId });
    const log = await html(volunteer, "/log");
    expect(bannerName(log)).toBe(runningName);
    expect(log).not.toContain(f.demoDriveId);
  });

  it("lists the running drive first on the organiser's dashboard, before next season's", async () => {
    const page = await html(organiser, "/dashboard");
    const at = (name: string) => page.indexOf(`>${name}</a>`);
    expect(at(runningName)).toBeGreaterThan(-1);
    expect(at(futureName)).toBeGreaterThan(at(runningName));
  });
});
