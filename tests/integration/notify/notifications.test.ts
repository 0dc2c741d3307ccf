import { afterAll, describe, expect, it } from "vitest";
import { db } from "@/lib/db";
import { stopJobs } from "@/lib/jobs/queue";
import { runNotificationSweep } from "@/lib/notify/sweep";
import { testDb } from "@/tests/support/db";
import { APP_URL } from "@/tests/support/env";
import { ApiClient } from "@/tests/support/http";
import { freshGroup, haulAndSort, type FreshGroup } from "@/tests/support/ledger";
import { mailTo, waitForMail, type CapturedMail } from "@/tests/support/mail";

// The notification sweep, run at moments the test chooses (not by waiting for
// the clock): the run reminder the day before in the group's time zone, the
// organiser's weekly summary, RFC 8058 one-click unsubscribe, and sending once.
//
// The group's zone is Pacific/Auckland (UTC+13 in February, daylight time), so
// the group's calendar day differs from UTC's at the moments used: an answer
// computed on UTC days would fail here.
const ZONE = "Pacific/Auckland";
// 2027-02-15 is a Monday (2027-02-01 is a Monday; ISO 8601 weeks start on Monday).
const RUN_DAY = "2027-02-17";
const DAY_BEFORE_10AM = new Date("2027-02-15T21:00:00Z"); // Tue 16 Feb 2027, 10:00 in Auckland
const DAY_BEFORE_7AM = new Date("2027-02-15T18:00:00Z"); // Tue 16 Feb, 07:00: before reminders go out (08:00)
const TWO_DAYS_BEFORE = new Date("2027-02-14T21:00:00Z"); // Mon 15 Feb, 10:00
const MONDAY_9AM = new Date("2027-02-14T20:00:00Z"); // Mon 15 Feb 2027, 09:00 in Auckland (Sunday in UTC)
const MONDAY_7AM = new Date("2027-02-14T18:00:00Z"); // Mon 15 Feb, 07:00

afterAll(async () => {
  await stopJobs();
  await db.destroy();
});

async function setUp(label: string): Promise<FreshGroup & { ids: Record<string, string> }> {
  const g = await freshGroup(label);
  const t = testDb();
  await t("groups").where({ id: g.groupId }).update({ time_zone: ZONE });
  const ids: Record<string, string> = {};
  for (const [who, email] of Object.entries(g.emails)) ids[who] = (await t("users").where({ email }).first()).id;
  return { ...g, ids };
}

async function addRun(g: FreshGroup & { ids: Record<string, string> }, assignee: string, plannedOn = RUN_DAY) {
  const t = testDb();
  const [run] = await t("pickup_runs")
    .insert({ group_id: g.groupId, drive_id: g.driveId, planned_on: plannedOn, start_lat: 47.2, start_lng: -8, distance_km: 2.5, assignee_id: assignee, notes: "Van keys at the hall" })
    .returning("id");
  for (const [position, pointId] of g.dropPointIds.entries()) {
    await t("pickup_run_stops").insert({ run_id: run.id, group_id: g.groupId, drop_point_id: pointId, position, leg_km: 1.2 });
  }
  return run.id as string;
}

const subjectHas = (words: string) => (m: CapturedMail) => m.subject.includes(words);

describe("the run reminder", () => {
  it("goes out the day before the run in the group's time zone, with stops, addresses, hours, access notes and hosts", async () => {
    const g = await setUp("remind");
    const t = testDb();
    await t("drop_points").where({ id: g.dropPointIds[0] }).update({
      address: "4 Wickmere Lane",
      hours: "Mon–Sat 8–18",
      access_notes: "Side gate code 4417",
      host_name: "Ines Fairweather",
      host_phone: "+44 7700 900123",
      host_email: "ines@wickmere.test",
    });
    // Structured hours (ISO 8601 weekday numbers: 6 = Saturday, 7 = Sunday) with the free text kept as notes on them.
    await t("drop_points").where({ id: g.dropPointIds[1] }).update({
      address: "Old tannery yard",
      hours: "Ring at the side door",
      opening_hours: JSON.stringify([{ days: [6, 7], opens: "09:00", closes: "12:00" }]),
    });
    const runId = await addRun(g, g.ids.volunteer);

    expect((await runNotificationSweep(TWO_DAYS_BEFORE, [g.groupId])).runReminders).toBe(0);
    expect((await runNotificationSweep(DAY_BEFORE_7AM, [g.groupId])).runReminders).toBe(0);
    expect((await runNotificationSweep(DAY_BEFORE_10AM, [g.groupId])).runReminders).toBe(1);

    const mail = await waitForMail(g.emails.volunteer, subjectHas("Tomorrow: your pickup run"));
    expect(mail.subject).toBe("Tomorrow: your pickup run, 2 stops (17 Feb 2027)");
    expect(mail.text).toContain("Tomorrow, 17 February 2027, you have a pickup run");
    const stop1 = mail.text.indexOf("1. North porch");
    const stop2 = mail.text.indexOf("2. South gate");
    expect(stop1).toBeGreaterThan(-1);
    expect(stop2).toBeGreaterThan(stop1);
    for (const part of ["Address: 4 Wickmere Lane", "Hours: Mon–Sat 8–18", "Access: Side gate code 4417", "Host: Ines Fairweather, +44 7700 900123, ines@wickmere.test", "Address: Old tannery yard", "Hours: Sat, Sun 09:00–12:00 · Ring at the side door", "Van keys at the hall"]) {
      expect(mail.text).toContain(part);
    }
    expect(mail.text).toContain(`${APP_URL}/runs/${runId}`);

    // Once per run and volunteer, however often the sweep runs.
    expect((await runNotificationSweep(DAY_BEFORE_10AM, [g.groupId])).runReminders).toBe(0);
    const sent = await t("notification_sends").where({ kind: "runReminder", group_id: g.groupId });
    expect(sent).toHaveLength(1);
    expect(sent[0].key).toBe(`${runId}:${g.ids.volunteer}:${RUN_DAY}`);
  });

  it("is sent once even when two sweeps run at the same moment (two servers)", async () => {
    const g = await setUp("remind-twice");
    await addRun(g, g.ids.volunteer);
    const results = await Promise.all([runNotificationSweep(DAY_BEFORE_10AM, [g.groupId]), runNotificationSweep(DAY_BEFORE_10AM, [g.groupId])]);
    expect(results[0].runReminders + results[1].runReminders).toBe(1);
    await waitForMail(g.emails.volunteer, subjectHas("Tomorrow: your pickup run"));
    await new Promise((r) => setTimeout(r, 500));
    expect((await mailTo(g.emails.volunteer)).filter(subjectHas("Tomorrow: your pickup run"))).toHaveLength(1);
  });

  it("is not sent to a person who switched it off in their settings", async () => {
    const g = await setUp("remind-off");
    const volunteer2 = await g.client("volunteer2");
    const put = await volunteer2.json<Record<string, boolean>>("PUT", "/api/me/notifications", { runReminder: false });
    expect(put.status).toBe(200);
    expect(put.body).toEqual({ runReminder: false, weeklySummary: true, unitReady: true });
    await addRun(g, g.ids.volunteer2);
    await addRun(g, g.ids.volunteer);
    expect((await runNotificationSweep(DAY_BEFORE_10AM, [g.groupId])).runReminders).toBe(1);
    await waitForMail(g.emails.volunteer, subjectHas("Tomorrow"));
    expect((await mailTo(g.emails.volunteer2)).filter(subjectHas("Tomorrow"))).toHaveLength(0);
  });
});

describe("one-click unsubscribe (RFC 8058)", () => {
  it("carries the headers RFC 8058 asks for, and its POST switches the kind off without a session", async () => {
    const g = await setUp("unsub");
    await addRun(g, g.ids.volunteer);
    await runNotificationSweep(DAY_BEFORE_10AM, [g.groupId]);
    const mail = await waitForMail(g.emails.volunteer, subjectHas("Tomorrow"));
    // RFC 8058 §3.1 (quoted from memory): "The List-Unsubscribe header field MUST contain one HTTPS URI"
    // (in angle brackets, RFC 2369 §3.1), and "The List-Unsubscribe-Post header MUST contain the single
    // key/value pair "List-Unsubscribe=One-Click"".
    const header = mail.headers["list-unsubscribe"];
    expect(header).toMatch(/^<https:\/\/[^<>\s,]+>$/);
    expect(mail.headers["list-unsubscribe-post"]).toBe("List-Unsubscribe=One-Click");
    const url = new URL(header.slice(1, -1));
    expect(url.host).toBe(new URL(APP_URL).host);
    expect(url.pathname).toMatch(/^\/api\/unsubscribe\/[0-9a-f]{32}\.runReminder\.[A-Za-z0-9_-]{43}$/);
    // The local stack serves no TLS: the same path over its own http origin.
    const local = `${APP_URL}${url.pathname}`;
    const t = testDb();
    const optout = () => t("notification_optouts").where({ user_id: g.ids.volunteer, kind: "runReminder" }).first();

    // A GET (a link scanner, a prefetch) changes nothing; it shows the confirm page.
    const get = await fetch(local, { redirect: "manual" });
    expect(get.status).toBe(303);
    expect(get.headers.get("location")).toBe(`/unsubscribe/${url.pathname.split("/").pop()}`);
    expect(await optout()).toBeUndefined();

    // A token altered by one character is refused and changes nothing (RFC 8058 §4: hard to forge).
    const forged = local.slice(0, -1) + (local.endsWith("A") ? "B" : "A");
    const bad = await fetch(forged, { method: "POST", headers: { "content-type": "application/x-www-form-urlencoded" }, body: "List-Unsubscribe=One-Click" });
    expect(bad.status).toBe(404);
    expect(await optout()).toBeUndefined();

    // RFC 8058 §3.2: the receiver POSTs "List-Unsubscribe=One-Click", with no cookies or authorisation.
    const anonymous = new ApiClient();
    const post = await anonymous.request("POST", url.pathname, "List-Unsubscribe=One-Click", { "content-type": "application/x-www-form-urlencoded" });
    expect(post.status).toBe(200);
    expect(await post.json()).toMatchObject({ unsubscribed: "runReminder" });
    expect(await optout()).toMatchObject({ via: "oneClick" });

    // No further reminders of that kind; the other kinds stay on.
    await addRun(g, g.ids.volunteer);
    expect((await runNotificationSweep(DAY_BEFORE_10AM, [g.groupId])).runReminders).toBe(0);
    const settings = await (await g.client("volunteer")).json("GET", "/api/me/notifications");
    expect(settings.body).toEqual({ runReminder: false, weeklySummary: true, unitReady: true });
  });
});

describe("the weekly summary", () => {
  it("tells each organiser once a week: progress towards the target, full bins, pledges due and runs done", async () => {
    const g = await setUp("summary");
    const t = testDb();
    await haulAndSort(await g.client("volunteer"), g.driveId, g.dropPointIds[0], 40);
    await t("fill_reports").insert({ group_id: g.groupId, drop_point_id: g.dropPointIds[0], level: 100, note: "" });
    const pledge = (bringOn: string, bags: number) => ({ group_id: g.groupId, drive_id: g.driveId, drop_point_id: g.dropPointIds[1], name: "A donor", bags, bring_on: bringOn });
    // The 11-bag pledge is due in the week but the donor cancelled it: it is not due any more.
    await t("pledges").insert([pledge("2027-02-18", 3), pledge("2027-02-10", 5), pledge("2027-03-01", 7), { ...pledge("2027-02-19", 11), status: "cancelled" }]);
    const doneRun = await addRun(g, g.ids.volunteer, "2027-02-12");
    await t("pickup_runs").where({ id: doneRun }).update({ state: "done", finished_at: new Date("2027-02-12T02:00:00Z") });
    const oldRun = await addRun(g, g.ids.volunteer2, "2027-01-20");
    await t("pickup_runs").where({ id: oldRun }).update({ state: "done", finished_at: new Date("2027-01-20T02:00:00Z") });

    expect((await runNotificationSweep(MONDAY_7AM, [g.groupId])).weeklySummaries).toBe(0);
    expect((await runNotificationSweep(MONDAY_9AM, [g.groupId])).weeklySummaries).toBe(1);
    expect((await runNotificationSweep(MONDAY_9AM, [g.groupId])).weeklySummaries).toBe(0);

    const mail = await waitForMail(g.emails.organiser, subjectHas("your week from 15 Feb 2027"));
    // The target as the public drive endpoint (CONTRACT.md) reports it.
    const pub = await new ApiClient().json<{ target: { cans: number } }>("GET", `/api/public/drives/${g.driveSlug}`);
    const target = pub.body.target.cans;
    expect(target).toBeGreaterThan(40);
    const share = new Intl.NumberFormat("en-GB", { style: "percent" }).format(40 / target);
    expect(mail.text).toContain(`Progress: 40 good cans of ${target} (${share}); ${target - 40} still to come`);
    expect(mail.text).toContain("Full bins: North porch");
    expect(mail.text).toContain("18 Feb 2027: 3 bags at South gate");
    expect(mail.text).not.toContain("5 bags");
    expect(mail.text).not.toContain("7 bags");
    expect(mail.text).not.toContain("11 bags");
    expect(mail.text).toMatch(/12 Feb 2027, Drive [^:]+: 2 stops, Test volunteer\n/);
    expect(mail.text).not.toContain("20 Jan 2027");
    expect(mail.headers["list-unsubscribe"]).toMatch(/\.weeklySummary\./);
    // Organisers only.
    expect((await mailTo(g.emails.volunteer)).filter(subjectHas("your week"))).toHaveLength(0);
  });
});
