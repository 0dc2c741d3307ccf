import { afterAll, describe, expect, it } from "vitest";
import { db } from "@/lib/db";
import { stopJobs } from "@/lib/jobs/queue";
import { unitNeed } from "@/lib/heaters/need";
import { readyPunched } from "@/lib/notify/unit-ready";
import { runNotificationSweep } from "@/lib/notify/sweep";
import { testDb } from "@/tests/support/db";
import { freshGroup, haulAndSort } from "@/tests/support/ledger";
import { mailTo, waitForMail } from "@/tests/support/mail";
import type { ApiClient } from "@/tests/support/http";

// The builder's "enough punched cans to claim for your unit" note: sent once per
// unit, when the drive's punched cans beyond every claim reach what the unit
// still needs (its cans plus its spare share, less what it claimed or built in).
afterAll(async () => {
  await stopJobs();
  await db.destroy();
});

async function process(c: ApiClient, driveId: string, from: string, to: string, quantity: number) {
  const res = await c.json("POST", `/api/drives/${driveId}/processing`, { from, to, quantity });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
}

describe("the unit-ready note", () => {
  it("waits until unclaimed punched cans cover the unit's remaining need, then goes out once", async () => {
    const g = await freshGroup("unit-ready");
    const [unitA, unitB] = g.heaterIds;
    const volunteer = await g.client("volunteer");
    const builder = await g.client("builder");
    const sentFor = async (unitId: string) => testDb()("notification_sends").where({ kind: "unitReady", key: unitId }).first();
    const subject = (name: string) => (m: { subject: string }) => m.subject === `Cans ready to claim for ${name}`;

    // Each unit: 132 cans plus 5 % spare, rounded up per unit (unit_spare, db/functions/unit_need.sql) = 139.
    const { spare } = (await testDb().raw("select unit_spare(132, 5)::int as spare")).rows[0];
    expect(unitNeed(132, spare, 0, 0).need).toBe(139);
    await haulAndSort(volunteer, g.driveId, g.dropPointIds[0], 150);
    await process(volunteer, g.driveId, "good", "washed", 150);
    await process(volunteer, g.driveId, "washed", "opened", 150);
    await process(volunteer, g.driveId, "opened", "punched", 100);
    // 100 punched, nothing claimed: short of 139 for either unit.
    expect((await runNotificationSweep(new Date(), [g.groupId])).unitReady).toBe(0);

    // Unit A claims 60: it still needs 79, but only 100 − 60 = 40 punched cans are free.
    expect((await builder.json("POST", `/api/heaters/${unitA}/claims`, { quantity: 60 })).status).toBe(201);
    expect(readyPunched(100, 60)).toBe(40);
    expect((await runNotificationSweep(new Date(), [g.groupId])).unitReady).toBe(0);

    // 50 more punched: 150 − 60 = 90 free ≥ 79 for unit A; unit B still needs 139.
    await process(volunteer, g.driveId, "opened", "punched", 50);
    expect((await runNotificationSweep(new Date(), [g.groupId])).unitReady).toBe(1);
    expect(await sentFor(unitA)).toBeTruthy();
    expect(await sentFor(unitB)).toBeUndefined();
    const mail = await waitForMail(g.emails.builder, subject("Test unit A"));
    expect(mail.text).toContain("now has 90 punched cans waiting unclaimed, enough for the 79 that Test unit A still needs");
    expect(mail.text).toMatch(/\/units\/[0-9a-f-]{36}/);
    expect(mail.headers["list-unsubscribe-post"]).toBe("List-Unsubscribe=One-Click");

    // Once per unit: later sweeps send nothing more for it.
    expect((await runNotificationSweep(new Date(), [g.groupId])).unitReady).toBe(0);
    await new Promise((r) => setTimeout(r, 300));
    expect((await mailTo(g.emails.builder)).filter(subject("Test unit A"))).toHaveLength(1);
  });

  it("is not sent to a builder who switched it off", async () => {
    const g = await freshGroup("unit-ready-off");
    const builder = await g.client("builder");
    expect((await builder.json("PUT", "/api/me/notifications", { unitReady: false })).status).toBe(200);
    const volunteer = await g.client("volunteer");
    await haulAndSort(volunteer, g.driveId, g.dropPointIds[0], 150);
    await process(volunteer, g.driveId, "good", "washed", 150);
    await process(volunteer, g.driveId, "washed", "opened", 150);
    await process(volunteer, g.driveId, "opened", "punched", 150);
    expect((await runNotificationSweep(new Date(), [g.groupId])).unitReady).toBe(0);
    expect((await mailTo(g.emails.builder)).filter((m) => m.subject.startsWith("Cans ready"))).toHaveLength(0);
  });
});
