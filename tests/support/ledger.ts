import { randomUUID } from "node:crypto";
import { forTheFile, testDb } from "./db";
import { signedIn, type ApiClient } from "./http";
import { planColumns } from "@/lib/heaters/plan-columns";

// A group of its own for a ledger test: its balances and calibration start at
// zero, whatever the demo or other test files have written.
export interface FreshGroup {
  groupId: string;
  driveId: string;
  driveSlug: string;
  dropPointIds: string[];
  heaterIds: string[];
  emails: { organiser: string; volunteer: string; volunteer2: string; builder: string };
  client: (who: "organiser" | "volunteer" | "volunteer2" | "builder") => Promise<ApiClient>;
}

export async function freshGroup(label = "ledger"): Promise<FreshGroup> {
  const db = testDb();
  const tag = `${label}-${randomUUID().slice(0, 8)}`;
  const hash = (await db("users").where({ email: "organiser@cantrove.test" }).first()).password_hash;
  const [group] = await db("groups").insert({ slug: tag, name: `Test circle ${tag}`, town: "Larkhollow" }).returning("id");
  const emails = {
    organiser: `org-${tag}@example.test`,
    volunteer: `vol-${tag}@example.test`,
    volunteer2: `vol2-${tag}@example.test`,
    builder: `bld-${tag}@example.test`,
  };
  const userIds: Record<string, string> = {};
  for (const [role, email] of Object.entries(emails)) {
    const [u] = await db("users").insert({ email, name: `Test ${role}`, password_hash: hash, email_verified_at: db.fn.now() }).returning("id");
    await db("memberships").insert({ group_id: group.id, user_id: u.id, role: role === "volunteer2" ? "volunteer" : role });
    userIds[role] = u.id;
  }
  const [drive] = await db("drives")
    .insert({ group_id: group.id, slug: `drive-${tag}`, name: `Drive ${tag}`, starts_on: "2026-11-01", ends_on: "2027-02-28", is_public: true })
    .returning(["id", "slug"]);
  const dropPointIds: string[] = [];
  for (const [i, name] of ["North porch", "South gate"].entries()) {
    const [p] = await db("drop_points").insert({ group_id: group.id, drive_id: drive.id, name, lat: 47.2 + i / 100, lng: -8 }).returning("id");
    dropPointIds.push(p.id);
  }
  // Both units are built by the group's builder, who may claim for them.
  const heaterIds: string[] = [];
  for (const name of ["Test unit A", "Test unit B"]) {
    const [h] = await db("heater_units")
      .insert({ group_id: group.id, drive_id: drive.id, builder_id: userIds.builder, name, ...planColumns({ glazingWidth: 30, glazingHeight: 60, unit: "in", coverage: "chamber" }), columns: 11, rows: 12, cans: 132 })
      .returning("id");
    heaterIds.push(h.id);
  }
  const clients = new Map<string, ApiClient>();
  return {
    groupId: group.id,
    driveId: drive.id,
    driveSlug: drive.slug,
    dropPointIds,
    heaterIds,
    emails,
    client: async (who) => {
      if (!clients.has(who)) clients.set(who, await signedIn(emails[who]));
      return clients.get(who)!;
    },
  };
}

/** A fresh group for the whole test file (see forTheFile in db.ts). */
export const freshGroupForFile = (label: string): FreshGroup => forTheFile(() => freshGroup(label));

/**
 * Hauls 2 bags at a drop point and sorts them to exactly `good` good cans; returns the two bodies.
 * The sort is sent confirmed: callers set up stock of any size, and the question
 * about unusual counts has its own tests (ledger-plausibility.test.ts).
 */
export async function haulAndSort(c: ApiClient, driveId: string, dropPointId: string, good: number, rejected: Record<string, number> = {}) {
  const haul = await c.json<{ id: string; movementId: string; estimatedCans: number }>("POST", `/api/drives/${driveId}/hauls`, { dropPointId, bags: 2 });
  if (haul.status !== 201) throw new Error(`haul failed: ${haul.status} ${JSON.stringify(haul.body)}`);
  const sort = await c.json<{ movementId: string }>("POST", `/api/drives/${driveId}/sorts`, { haulIds: [haul.body.id], good, rejected, confirmUnusual: true });
  if (sort.status !== 201) throw new Error(`sort failed: ${sort.status} ${JSON.stringify(sort.body)}`);
  return { haul: haul.body, sort: sort.body };
}

/** A calendar day `days` from today (UTC), as YYYY-MM-DD; tests keep weeks from any edge, so the group's own zone never matters. */
export function dayFromToday(days: number): string {
  return new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);
}

/** Another drive for a fresh group, with one drop point unless `dropPoint: false`; returns its id. */
export async function addDrive(g: FreshGroup, d: { name: string; startsOn: string; endsOn: string; dropPoint?: boolean }): Promise<string> {
  const db = testDb();
  const slug = `${g.driveSlug}-${randomUUID().slice(0, 6)}`;
  const [drive] = await db("drives").insert({ group_id: g.groupId, slug, name: d.name, starts_on: d.startsOn, ends_on: d.endsOn, is_public: false }).returning("id");
  if (d.dropPoint !== false) await db("drop_points").insert({ group_id: g.groupId, drive_id: drive.id, name: `${d.name} porch`, lat: 47.3, lng: -8 });
  return drive.id as string;
}

/** Group A's volunteer, who is also a member of a second fresh group B (as `roleInB`): both groups, the person's id and the groups' names. */
export async function volunteerInTwoGroups(label: string, roleInB: "organiser" | "volunteer" | "builder") {
  const [a, b] = [await freshGroup(`${label}-a`), await freshGroup(`${label}-b`)];
  const db = testDb();
  const userId = (await db("users").where({ email: a.emails.volunteer }).first()).id as string;
  await db("memberships").insert({ group_id: b.groupId, user_id: userId, role: roleInB });
  const nameOf = async (id: string) => (await db("groups").where({ id }).first()).name as string;
  return { a, b, userId, nameA: await nameOf(a.groupId), nameB: await nameOf(b.groupId) };
}
