import { describe, expect, it } from "vitest";
import { freshGroup } from "@/tests/support/ledger";

// The group's look (time zone, locale, units) decides how its pages and exports
// read. Checked over HTTP against a group of its own, so no other test sees the change.
// References: 1 in = 25.4 mm exactly (NIST SP 811; international yard and pound agreement,
// 1959), so the fresh group's 30 × 60 in glazing is 762 × 1,524 mm; CLDR date patterns
// (en-GB "d MMM y, HH:mm", en-US "MMM d, y, h:mm a"), from memory.
const NBSP = "\u00a0";
// The page's text, without the comments React puts between adjacent text parts.
const pageText = async (res: Response) => (await res.text()).replaceAll("<!-- -->", "");

describe("the group's look", () => {
  it("starts as en-GB, metric, Europe/London; switching to imperial shows inches on the unit page", async () => {
    const g = await freshGroup("look");
    const org = await g.client("organiser");
    const before = await org.json("GET", "/api/group/look");
    expect(before.status).toBe(200);
    expect(before.body).toEqual({ timeZone: "Europe/London", locale: "en-GB", units: "metric" });

    // The plan was saved in inches; a metric group reads it in millimetres.
    const metric = await pageText(await org.get(`/units/${g.heaterIds[0]}`));
    expect(metric).toContain(`Glazing 762${NBSP}mm × 1,524${NBSP}mm`);

    const put = await org.json("PUT", "/api/group/look", { timeZone: "America/New_York", locale: "en-US", units: "imperial" });
    expect(put.status).toBe(200);
    const imperial = await pageText(await org.get(`/units/${g.heaterIds[0]}`));
    expect(imperial).toContain(`Glazing 30${NBSP}in × 60${NBSP}in`);
    expect(imperial).not.toContain(`762${NBSP}mm`);
  });

  it("writes the export's local column in the group's zone and locale", async () => {
    const g = await freshGroup("look-csv");
    const org = await g.client("organiser");
    expect((await org.json("PUT", "/api/group/look", { timeZone: "America/New_York", locale: "en-US", units: "metric" })).status).toBe(200);
    const vol = await g.client("volunteer");
    const haul = await vol.json("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[0], bags: 1, hauledAt: "2026-12-02T18:55:00Z" });
    expect(haul.status).toBe(201);
    const csv = await (await org.get(`/api/ledger/export?driveId=${g.driveId}`)).text();
    // 18:55 UTC is 13:55 in New York in December (EST, UTC−5; IANA tz database).
    expect(csv.split(/\r?\n/)[0]).toContain("occurred_local (America/New_York)");
    expect(csv).toMatch(/2026-12-02T18:55:00\.000Z,"Dec 2, 2026, 1:55[ \u00a0]PM",/);
  });

  it("is set by organisers only, and a wrong value is refused field by field", async () => {
    const g = await freshGroup("look-who");
    const vol = await g.client("volunteer");
    expect((await vol.json("PUT", "/api/group/look", { timeZone: "UTC", locale: "en-GB", units: "imperial" })).status).toBe(403);
    const org = await g.client("organiser");
    const bad = await org.json<{ error: { fields: Record<string, string> } }>("PUT", "/api/group/look", { timeZone: "Mars/Olympus", locale: "tlh", units: "cubits" });
    expect(bad.status).toBe(422);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(["locale", "timeZone", "units"]);
    expect(bad.body.error.fields.timeZone).toMatch(/time zone/i);
    expect((await org.json("GET", "/api/group/look")).body).toEqual({ timeZone: "Europe/London", locale: "en-GB", units: "metric" });
  });
});

