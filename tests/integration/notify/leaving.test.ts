import { describe, expect, it } from "vitest";
import { forTheFile, testDb } from "@/tests/support/db";
import { signedIn } from "@/tests/support/http";
import { createOwnGroup } from "@/tests/support/own-group";
import { LAST_ORGANISER_LEAVING } from "@/lib/accounts/leaving";

// Leaving a group and handing it over: the last organiser cannot leave
// (409), leaving ends the person's sessions, a hand-over stays in the group.
const g = forTheFile(async () => {
  const db = testDb();
  const main = await createOwnGroup(db, "leave-main");
  const other = await createOwnGroup(db, "leave-other");
  const idOf = async (email: string) => (await db("users").where({ email }).first()).id as string;
  return {
    main,
    other,
    ids: {
      organiser: await idOf(main.emails.organiser),
      volunteer: await idOf(main.emails.volunteer),
      builder: await idOf(main.emails.builder),
      otherVolunteer: await idOf(other.emails.volunteer),
    },
  };
});

const roleIn = async (groupId: string, userId: string) =>
  ((await testDb()("memberships").where({ group_id: groupId, user_id: userId }).first()) as { role: string } | undefined)?.role ?? null;

describe("leaving a group", () => {
  it("refuses the last organiser with 409 and a message that says what to do", async () => {
    const organiser = await signedIn(g.main.emails.organiser);
    const res = await organiser.json<{ error: { code: string; message: string } }>("POST", "/api/me/leave", { confirm: true });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe("conflict");
    expect(res.body.error.message).toBe(LAST_ORGANISER_LEAVING);
    expect(res.body.error.message).toMatch(/hand the organiser role to another member/i);
    expect(await roleIn(g.main.groupId, g.ids.organiser)).toBe("organiser");
    expect((await organiser.get("/api/me")).status).toBe(200);
  });

  it("lets a volunteer leave; their session ends and their run goes back unassigned", async () => {
    const db = testDb();
    const [run] = await db("pickup_runs")
      .insert({ group_id: g.main.groupId, drive_id: g.main.driveId, planned_on: "2027-01-20", start_lat: 52, start_lng: -1.6, distance_km: 1, assignee_id: g.ids.volunteer })
      .returning("id");
    const volunteer = await signedIn(g.main.emails.volunteer);
    const res = await volunteer.json<{ left: boolean; groupsLeft: number }>("POST", "/api/me/leave", { confirm: true });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ left: true, groupsLeft: 0 });
    expect(await roleIn(g.main.groupId, g.ids.volunteer)).toBeNull();
    expect((await volunteer.get("/api/me")).status).toBe(401);
    expect((await db("pickup_runs").where({ id: run.id }).first()).assignee_id).toBeNull();
  });
});

describe("handing the group over", () => {
  it("cannot hand over to another group's member (404) or to oneself (409)", async () => {
    const organiser = await signedIn(g.main.emails.organiser);
    const elsewhere = await organiser.json("POST", `/api/members/${g.ids.otherVolunteer}/hand-over`, { then: "volunteer" });
    expect(elsewhere.status).toBe(404);
    expect(await roleIn(g.other.groupId, g.ids.otherVolunteer)).toBe("volunteer");
    const self = await organiser.json("POST", `/api/members/${g.ids.organiser}/hand-over`, { then: "builder" });
    expect(self.status).toBe(409);
    expect(await roleIn(g.main.groupId, g.ids.organiser)).toBe("organiser");
  });

  it("makes the other member organiser, then the old organiser leaves and is signed out", async () => {
    const organiser = await signedIn(g.main.emails.organiser);
    const res = await organiser.json<{ organiser: string; then: string }>("POST", `/api/members/${g.ids.builder}/hand-over`, { then: "leave" });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ organiser: g.ids.builder, then: "leave" });
    expect(await roleIn(g.main.groupId, g.ids.builder)).toBe("organiser");
    expect(await roleIn(g.main.groupId, g.ids.organiser)).toBeNull();
    expect((await organiser.get("/api/me")).status).toBe(401);
    // The new organiser is now the last one: the same rule holds for them.
    const next = await signedIn(g.main.emails.builder);
    expect((await next.get("/api/me")).status).toBe(200);
    expect((await next.json("POST", "/api/me/leave", { confirm: true })).status).toBe(409);
  });

  it("can keep the old organiser as a volunteer instead", async () => {
    const db = testDb();
    const own = await createOwnGroup(db, "leave-stay");
    const volunteerId = (await db("users").where({ email: own.emails.volunteer }).first()).id;
    const organiserId = (await db("users").where({ email: own.emails.organiser }).first()).id;
    const organiser = await signedIn(own.emails.organiser);
    const res = await organiser.json("POST", `/api/members/${volunteerId}/hand-over`, { then: "volunteer" });
    expect(res.status).toBe(200);
    expect(await roleIn(own.groupId, volunteerId)).toBe("organiser");
    expect(await roleIn(own.groupId, organiserId)).toBe("volunteer");
    // Still signed in, now as a volunteer: organiser routes are closed to them.
    expect((await organiser.get("/api/me")).status).toBe(200);
    expect((await organiser.get("/api/members")).status).toBe(403);
  });
});
