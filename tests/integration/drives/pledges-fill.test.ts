import { afterAll, describe, expect, it } from "vitest";
import { ApiClient } from "@/tests/support/http";
import { closeTestDb, testDb } from "@/tests/support/db";
import { freshGroup } from "@/tests/support/ledger";
import { mailTo, waitForMail } from "@/tests/support/mail";

const anon = new ApiClient();
afterAll(closeTestDb);

describe("pledges", () => {
  it("stores a pledge, e-mails a confirmation to the given address, and shows it to organisers only", async () => {
    const g = await freshGroup("pledge");
    const email = `donor-${g.groupId.slice(0, 8)}@example.test`;
    const res = await anon.json<{ id: string; mailed: boolean }>("POST", `/api/public/drives/${g.driveSlug}/pledges`, {
      dropPointId: g.dropPointIds[0],
      name: "Bram Holloway",
      email,
      bags: 3,
      bringOn: "2026-12-12",
    });
    expect(res.status).toBe(201);
    expect(res.body.mailed).toBe(true);
    const mail = await waitForMail(email);
    expect(mail.subject).toContain(`Drive ${g.driveSlug.replace("drive-", "")}`);
    expect(mail.text).toContain("3 bags");
    expect(mail.text).toContain("North porch");
    expect(mail.headers["x-cantrove-group"]).toBe(g.groupId);
    const row = await testDb()("pledges").where({ id: res.body.id }).first();
    expect(row).toMatchObject({ group_id: g.groupId, bags: 3, email });
  });

  it("takes a pledge without name or e-mail and sends nothing", async () => {
    const g = await freshGroup("pledge-anon");
    const res = await anon.json<{ mailed: boolean }>("POST", `/api/public/drives/${g.driveSlug}/pledges`, { dropPointId: g.dropPointIds[1], bags: 1, bringOn: "2026-12-01" });
    expect(res.status).toBe(201);
    expect(res.body.mailed).toBe(false);
  });

  it("refuses a drop point of another drive and a bad e-mail, writing nothing", async () => {
    const a = await freshGroup("pledge-a");
    const b = await freshGroup("pledge-b");
    const wrong = await anon.json<{ error: { fields: Record<string, string> } }>("POST", `/api/public/drives/${a.driveSlug}/pledges`, { dropPointId: b.dropPointIds[0], bags: 1, bringOn: "2026-12-01" });
    expect(wrong.status).toBe(422);
    expect(wrong.body.error.fields.dropPointId).toBeTruthy();
    const bad = await anon.json<{ error: { fields: Record<string, string> } }>("POST", `/api/public/drives/${a.driveSlug}/pledges`, { dropPointId: a.dropPointIds[0], bags: 1, bringOn: "2026-12-01", email: "not-an-address" });
    expect(bad.status).toBe(422);
    expect(bad.body.error.fields.email).toMatch(/does not look right/);
    expect(await testDb()("pledges").where({ drive_id: a.driveId }).first()).toBeUndefined();
  });
});

describe("this bin is full", () => {
  it("e-mails the organisers once per fill episode; a haul starts a new episode", async () => {
    const g = await freshGroup("fill");
    const url = `/api/public/drives/${g.driveSlug}/drop-points/${g.dropPointIds[0]}/fill-reports`;
    const binMail = async () => (await mailTo(g.emails.organiser)).filter((m) => m.subject.startsWith("Bin filling up"));

    expect((await anon.json<{ alerted: boolean }>("POST", url, { level: 50 })).body.alerted).toBe(false);
    const first = await anon.json<{ alerted: boolean }>("POST", url, { level: 75, note: "Bags on the ground too" });
    expect(first.status).toBe(201);
    expect(first.body.alerted).toBe(true);
    const mail = await waitForMail(g.emails.organiser, (m) => m.subject.startsWith("Bin filling up"));
    expect(mail.subject).toContain("North porch");
    expect(mail.text).toContain("Bags on the ground too");
    expect((await anon.json<{ alerted: boolean }>("POST", url, { level: 100 })).body.alerted).toBe(false);
    await new Promise((r) => setTimeout(r, 1000));
    expect(await binMail()).toHaveLength(1);
    // Volunteers and builders get no alert.
    expect((await mailTo(g.emails.volunteer)).filter((m) => m.subject.startsWith("Bin filling up"))).toHaveLength(0);

    const volunteer = await g.client("volunteer");
    const haul = await volunteer.json("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[0], bags: 4 });
    expect(haul.status).toBe(201);
    expect((await anon.json<{ alerted: boolean }>("POST", url, { level: 100 })).body.alerted).toBe(true);
    for (let i = 0; i < 25 && (await binMail()).length < 2; i++) await new Promise((r) => setTimeout(r, 200));
    expect(await binMail()).toHaveLength(2);
  });

  it("sends one alert when two full reports arrive at the same moment", async () => {
    const g = await freshGroup("fill-race");
    const url = `/api/public/drives/${g.driveSlug}/drop-points/${g.dropPointIds[1]}/fill-reports`;
    const results = await Promise.all([1, 2, 3].map(() => anon.json<{ alerted: boolean }>("POST", url, { level: 100 })));
    expect(results.filter((r) => r.body.alerted)).toHaveLength(1);
  });

  it("refuses a level that is not one of the choices", async () => {
    const g = await freshGroup("fill-bad");
    const res = await anon.json("POST", `/api/public/drives/${g.driveSlug}/drop-points/${g.dropPointIds[0]}/fill-reports`, { level: 80 });
    expect(res.status).toBe(422);
    expect(await testDb()("fill_reports").where({ drop_point_id: g.dropPointIds[0] }).first()).toBeUndefined();
  });
});

describe("fill report photos", () => {
  const start = (fillReportId: string, file = { name: "full.png", size: 2000, type: "image/png", lastModified: 0 }) =>
    anon.request("POST", "/api/uploadthing?actionType=upload&slug=fillReportPhoto", { files: [file], input: { fillReportId } });

  it("lets anyone start a photo upload for a fresh report, but not an old one or a non-image", async () => {
    const g = await freshGroup("fill-photo");
    const report = await anon.json<{ id: string }>("POST", `/api/public/drives/${g.driveSlug}/drop-points/${g.dropPointIds[0]}/fill-reports`, { level: 100 });
    const fresh = await start(report.body.id);
    expect(fresh.status).toBe(200);
    await fresh.text();
    const pdf = await start(report.body.id, { name: "x.pdf", size: 2000, type: "application/pdf", lastModified: 0 });
    expect(pdf.status).toBe(400);
    await pdf.text();
    await testDb()("fill_reports").where({ id: report.body.id }).update({ created_at: testDb().raw("now() - interval '1 hour'") });
    const stale = await start(report.body.id);
    expect([400, 404]).toContain(stale.status);
    expect(await stale.text()).toMatch(/cannot take a photo/);
  });
});
