import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { testDb } from "@/tests/support/db";
import { addDrive, freshGroupForFile } from "@/tests/support/ledger";
import type { ApiClient } from "@/tests/support/http";

// The drive's "Archived" card (issue 16): it lists every archived photo (a drop point's
// own and a fill report's), and where it stops at 100 fill reports or photos it says
// how many there are in all.
const g = freshGroupForFile("archived-card");
let org: ApiClient;
let driveId = "";
let pointId = "";

type Listed = { id: string; of?: string }[];
type Archived = { fillReports: Listed; photos: Listed; totals: Record<string, number> };

beforeAll(async () => {
  org = await g.client("organiser");
  driveId = await addDrive(g, { name: "Archived card drive", startsOn: "2026-12-01", endsOn: "2027-01-31" });
  pointId = (await testDb()("drop_points").where({ drive_id: driveId }).first("id")).id;
});

const archived = async () => (await org.json<Archived>("GET", `/api/drives/${driveId}/archived`)).body;
const card = async () => {
  const html = (await (await org.get(`/organise/drives/${driveId}`)).text()).replace(/<!-- -->/g, "");
  return html.slice(html.indexOf('data-testid="archived-of-drive"'));
};
const post = (path: string) => org.json("POST", path, {}, { "Idempotency-Key": randomUUID() });

async function photo(purpose: "drop-point-photo" | "fill-report-photo", subjectId: string) {
  const key = `archived-card-${randomUUID()}`;
  const [row] = await testDb()("files")
    .insert({ group_id: g.groupId, key, url: `http://127.0.0.1/f/${key}`, name: "bin.png", size: 10, mime: "image/png", purpose, subject_id: subjectId })
    .returning("id");
  return { id: row.id as string, url: `http://127.0.0.1/f/${key}` };
}

describe("the drive's Archived card", () => {
  it("lists an archived photo of a fill report as well as a drop point's, and restores it", async () => {
    const [report] = await testDb()("fill_reports").insert({ group_id: g.groupId, drop_point_id: pointId, level: 50, note: "card test" }).returning("id");
    const { id: reportPhoto, url: reportPhotoUrl } = await photo("fill-report-photo", report.id);
    await testDb()("fill_reports").where({ id: report.id }).update({ photo_file_id: reportPhoto });
    const { id: pointPhoto } = await photo("drop-point-photo", pointId);
    // The drive's fill-report list offers a report's photo as a "See the photo" link.
    const offered = async () => (await (await org.get(`/organise/drives/${driveId}`)).text()).includes(`href="${reportPhotoUrl}" class="tap">See the photo`);
    expect(await offered()).toBe(true);
    expect((await post(`/api/photos/${reportPhoto}/archive`)).status).toBe(200);
    // Archived, it is no longer offered with its report in the drive's list.
    expect(await offered()).toBe(false);
    expect((await post(`/api/photos/${pointPhoto}/archive`)).status).toBe(200);

    const shelf = await archived();
    expect(shelf.photos.map((p) => [p.id, p.of]).sort()).toEqual([[pointPhoto, "dropPoint"], [reportPhoto, "fillReport"]].sort());
    expect(shelf.totals.photos).toBe(2);
    const html = await card();
    expect(html).toContain("Archived photo of a fill report at Archived card drive porch");
    expect(html).toContain("Archived photo of the bin at Archived card drive porch");
    expect(html).toContain("Fill report photo · Archived card drive porch");
    expect(html).not.toContain("Showing");

    expect((await post(`/api/photos/${reportPhoto}/restore`)).status).toBe(200);
    expect((await archived()).photos.map((p) => p.id)).toEqual([pointPhoto]);
    expect(await offered()).toBe(true);
  });

  it("says it shows 100 of N when more fill reports are archived than it lists", async () => {
    const N = 103;
    const start = Date.parse("2026-12-02T08:00:00Z");
    await testDb()("fill_reports").insert(
      Array.from({ length: N }, (_, i) => ({
        group_id: g.groupId,
        drop_point_id: pointId,
        level: 25,
        note: `archived ${i}`,
        created_at: new Date(start + i * 60_000),
        archived_at: new Date(start + i * 60_000 + 1),
      })),
    );
    const shelf = await archived();
    expect(shelf.fillReports).toHaveLength(100);
    expect(shelf.totals.fillReports).toBe(N);
    const html = await card();
    expect(html).toMatch(/data-testid="archived-fillReport-shown"[^>]*>Showing 100 of 103, the newest first/);
    // The card's count is every archived record, not only those listed: 103 reports and 1 photo.
    const page = (await (await org.get(`/organise/drives/${driveId}`)).text()).replace(/<!-- -->/g, "");
    expect(page).toContain(`Archived (${N + 1})`);
  });
});
