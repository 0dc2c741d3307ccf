import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ApiClient } from "@/tests/support/http";
import { closeTestDb, testDb } from "@/tests/support/db";
import { freshGroup, type FreshGroup } from "@/tests/support/ledger";
import { SCRIPTED_SVG, TEXT_AS_PNG, jpegBytes, pngBytes, webpBytes } from "@/tests/support/images";
import { uploadThroughApp } from "./upload-client";

// Finding 3 of issue 12: an anonymous photo could be a scripted SVG and a
// 13-byte text file named fake.png was taken as a drop-point photo. Now the
// bytes decide, when the upload service reports the file.

let g: FreshGroup;
let organiser: ApiClient;
const anon = new ApiClient();

beforeAll(async () => {
  g = await freshGroup("photo-bytes");
  organiser = await g.client("organiser");
});
afterAll(closeTestDb);

const fileRow = (key: string | undefined) => testDb()("files").where({ key: key ?? "" }).first();
const dropPointPhoto = (file: { name: string; type: string; bytes: Uint8Array }) =>
  uploadThroughApp(organiser, "dropPointPhoto", { dropPointId: g.dropPointIds[0] }, file);

describe("photos are judged by their bytes", () => {
  it.each([
    { what: "a scripted SVG named like a PNG", name: "bin.png", bytes: SCRIPTED_SVG },
    { what: "a 13-byte text file named fake.png", name: "fake.png", bytes: TEXT_AS_PNG },
  ])("refuses $what: a clear message, no files row, nothing served afterwards", async ({ name, bytes }) => {
    const out = await dropPointPhoto({ name, type: "image/png", bytes });
    expect(out.presignStatus).toBe(200);
    expect(out.serverData?.refused).toMatch(/^That file is not a JPEG, PNG or WebP photo/);
    expect(out.serverData?.url).toBeUndefined();
    expect(await fileRow(out.key)).toBeUndefined();
    const served = await fetch(out.ufsUrl!);
    expect(served.status).toBe(404);
    await served.body?.cancel();
  });

  it("refuses an anonymous bin-full photo that is an SVG, and leaves the report without a photo", async () => {
    const report = await anon.json<{ id: string }>("POST", `/api/public/drives/${g.driveSlug}/drop-points/${g.dropPointIds[1]}/fill-reports`, { level: 100 });
    expect(report.status).toBe(201);
    const out = await uploadThroughApp(anon, "fillReportPhoto", { fillReportId: report.body.id }, { name: "full.png", type: "image/png", bytes: SCRIPTED_SVG });
    expect(out.serverData?.refused).toMatch(/not a JPEG, PNG or WebP photo/);
    expect(await fileRow(out.key)).toBeUndefined();
    expect((await testDb()("fill_reports").where({ id: report.body.id }).first()).photo_file_id).toBeNull();
    expect((await fetch(out.ufsUrl!)).status).toBe(404);

    // The same report still takes a real photo afterwards.
    const real = await uploadThroughApp(anon, "fillReportPhoto", { fillReportId: report.body.id }, { name: "full.png", type: "image/png", bytes: pngBytes(16) });
    expect(real.serverData?.url).toBe(real.ufsUrl);
    const row = await fileRow(real.key);
    expect(row).toMatchObject({ mime: "image/png", purpose: "fill-report-photo", group_id: g.groupId });
    expect((await testDb()("fill_reports").where({ id: report.body.id }).first()).photo_file_id).toBe(row.id);
  });

  it("refuses to hand out an upload URL for a declared SVG, GIF or two photos at once", async () => {
    for (const type of ["image/svg+xml", "image/gif"]) {
      const out = await dropPointPhoto({ name: "x.img", type, bytes: SCRIPTED_SVG });
      expect(out.presignStatus).toBe(400);
      expect(out.key).toBeUndefined();
    }
    const two = await organiser.request(
      "POST",
      "/api/uploadthing?actionType=upload&slug=dropPointPhoto",
      { files: [{ name: "a.png", size: 100, type: "image/png", lastModified: 0 }, { name: "b.jpg", size: 100, type: "image/jpeg", lastModified: 0 }], input: { dropPointId: g.dropPointIds[0] } },
      { "x-uploadthing-package": "@uploadthing/react", "x-uploadthing-version": "7.7.4" },
    );
    expect(two.status).toBe(400);
    expect(await two.text()).toMatch(/one photo at a time/i);
  });

  it.each([
    { kind: "PNG", mime: "image/png", ext: "png", make: async () => pngBytes(12) },
    { kind: "JPEG", mime: "image/jpeg", ext: "jpg", make: () => jpegBytes(12) },
    { kind: "WebP", mime: "image/webp", ext: "webp", make: () => webpBytes(12) },
  ])("takes a real $kind, records its verified type and serves it inert", async ({ mime, ext, make }) => {
    const bytes = await make();
    const out = await dropPointPhoto({ name: `porch photo.${ext}`, type: mime, bytes });
    expect(out.serverData).toEqual({ url: out.ufsUrl });
    expect(await fileRow(out.key)).toMatchObject({ mime, purpose: "drop-point-photo", subject_id: g.dropPointIds[0], size: bytes.length });
    const served = await fetch(out.ufsUrl!);
    expect(served.status).toBe(200);
    expect(served.headers.get("content-type")).toBe(mime);
    expect(served.headers.get("x-content-type-options")).toBe("nosniff");
    expect(served.headers.get("content-disposition")).toBe(`inline; filename="porch-photo.${ext}"`);
    const csp = served.headers.get("content-security-policy") ?? "";
    expect(csp).toContain("default-src 'none'");
    expect(csp.split(";").map((d) => d.trim())).toContain("sandbox");
    expect(Buffer.from(await served.arrayBuffer()).equals(bytes)).toBe(true);
  });

  it("records and serves what the bytes are, not what the browser declared", async () => {
    const out = await dropPointPhoto({ name: "really-a-jpeg.png", type: "image/png", bytes: await jpegBytes(10) });
    expect(out.serverData?.url).toBe(out.ufsUrl);
    expect((await fileRow(out.key)).mime).toBe("image/jpeg");
    const served = await fetch(out.ufsUrl!);
    expect(served.headers.get("content-type")).toBe("image/jpeg");
    expect(served.headers.get("content-disposition")).toBe('inline; filename="really-a-jpeg.jpg"');
    await served.body?.cancel();
  });
});
