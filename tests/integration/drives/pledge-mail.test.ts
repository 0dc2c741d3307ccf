import { afterAll, describe, expect, it } from "vitest";
import { ApiClient } from "@/tests/support/http";
import { closeTestDb, testDb } from "@/tests/support/db";
import { freshGroup } from "@/tests/support/ledger";
import { mailTo, waitForMail } from "@/tests/support/mail";

// Finding 6 of issue 12 (mail part): 500 anonymous pledges naming one victim
// sent 500 "thank you" mails whose first line was the attacker's text with a link.

const anon = new ApiClient();
afterAll(closeTestDb);

const ATTACK = "Claim your prize at http://prize.example/win\r\nwww.prize.example or win@prize.example";
const settle = () => new Promise((r) => setTimeout(r, 1500));

// Each pledge from a client of its own, so the per-client pledge limit of one test leaves the next alone.
function pledge(slug: string, dropPointId: string, email: string, name = "Bram Holloway") {
  return new ApiClient().json<{ id: string; mailed: boolean }>("POST", `/api/public/drives/${slug}/pledges`, { dropPointId, name, email, bags: 2, bringOn: "2026-12-12" });
}

describe("one pledge confirmation per address, drive and day", () => {
  it("records 100 pledges naming one address but mails it once", async () => {
    const g = await freshGroup("pledge-flood");
    const victim = `victim-${g.groupId.slice(0, 8)}@example.test`;
    const statuses: number[] = [];
    // Four waves of 25 at once: concurrent enough to race, gentle on a small machine.
    for (let wave = 0; wave < 4; wave++) {
      const results = await Promise.all(Array.from({ length: 25 }, () => pledge(g.driveSlug, g.dropPointIds[0], victim)));
      statuses.push(...results.map((r) => r.status));
      expect(results.filter((r) => r.body.mailed).length).toBeLessThanOrEqual(wave === 0 ? 1 : 0);
    }
    // A per-client limit on pledges may answer 429; every pledge that was taken is recorded.
    expect(statuses.every((s) => s === 201 || s === 429)).toBe(true);
    const taken = statuses.filter((s) => s === 201).length;
    expect(taken).toBeGreaterThanOrEqual(1);
    const rows = await testDb()("pledges").where({ drive_id: g.driveId, email: victim }).count<{ n: string }[]>("* as n");
    expect(Number(rows[0].n)).toBe(taken);
    await waitForMail(victim);
    await settle();
    expect(await mailTo(victim)).toHaveLength(1);
  });

  it("counts differently written forms of one address as one, but another drive gets its own", async () => {
    const a = await freshGroup("pledge-forms");
    const b = await freshGroup("pledge-forms-b");
    const local = `donor-${a.groupId.slice(0, 8)}`;
    for (const email of [`${local}@example.test`, `${local.toUpperCase()}@EXAMPLE.test`, `${local}+again@example.test`]) {
      expect((await pledge(a.driveSlug, a.dropPointIds[0], email)).status).toBe(201);
    }
    expect((await pledge(b.driveSlug, b.dropPointIds[0], `${local}@example.test`)).body.mailed).toBe(true);
    await settle();
    const mails = [...(await mailTo(`${local}@example.test`)), ...(await mailTo(`${local}+again@example.test`))];
    expect(mails.map((m) => m.headers["x-cantrove-group"]).sort()).toEqual([a.groupId, b.groupId].sort());
  });
});

describe("text from anonymous people in mail", () => {
  it("keeps a pledge's name out of the subject and first line, with no live link", async () => {
    const g = await freshGroup("pledge-spam");
    const email = `spam-${g.groupId.slice(0, 8)}@example.test`;
    expect((await pledge(g.driveSlug, g.dropPointIds[0], email, ATTACK)).body.mailed).toBe(true);
    const mail = await waitForMail(email);
    expect(mail.subject).toBe(`Your pledge for the Drive ${g.driveSlug.replace("drive-", "")}`);
    const lines = mail.text.split(/\r?\n/);
    expect(lines[0]).not.toMatch(/prize/i);
    const nameLine = lines.find((l) => l.includes("prize"));
    expect(nameLine).toBe("Name given with the pledge: Claim your prize at prize[.]example/win www[.]prize[.]examp…");
    expect(mail.text).not.toMatch(/prize\.example|:\/\/prize|@prize/);
  });

  it("quotes a fill report's note to organisers with its links switched off", async () => {
    const g = await freshGroup("fill-spam");
    const res = await anon.json<{ alerted: boolean }>("POST", `/api/public/drives/${g.driveSlug}/drop-points/${g.dropPointIds[0]}/fill-reports`, { level: 100, note: ATTACK });
    expect(res.body.alerted).toBe(true);
    const mail = await waitForMail(g.emails.organiser, (m) => m.subject.startsWith("Bin filling up"));
    expect(mail.subject).toBe("Bin filling up: North porch");
    const lines = mail.text.split(/\r?\n/);
    expect(lines[0]).toBe("Someone at North porch reports the bin is: Full — no room left.");
    expect(mail.text).toContain('"Claim your prize at prize[.]example/win www[.]prize[.]example or win [at] prize[.]example"');
    expect(mail.text).not.toMatch(/prize\.example|:\/\/prize|@prize/);
  });
});
