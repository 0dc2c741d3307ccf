import { describe, expect, it } from "vitest";
import { forTheFile, testDb } from "@/tests/support/db";
import { signedIn, type ApiClient } from "@/tests/support/http";
import { createOwnGroup, type OwnGroup } from "@/tests/support/own-group";
import { likePattern } from "@/lib/search/queries";

// The organiser's search: every part filtered by the acting group in SQL.
// Two groups hold the same rare words; each organiser must find only their own.
interface Hit {
  kind: string;
  id: string;
  title: string;
  href: string;
}

const s = forTheFile(async () => {
  const db = testDb();
  const mine = await createOwnGroup(db, "search-mine", { dropPoint: "Quillfeather bakery porch" });
  const theirs = await createOwnGroup(db, "search-theirs", { dropPoint: "Quillfeather hall porch" });
  const word = "marmalade-coloured shutter";
  for (const g of [mine, theirs]) {
    await db("drop_points").where({ id: g.dropPointId }).update({ access_notes: `Bins behind the ${word}, ring twice.`, address: "12 Wickmere Lane" });
    await db("heater_units").where({ id: g.heaterId }).update({ notes: "Glazing from the old Quillfeather greenhouse" });
  }
  const organiser: ApiClient = await signedIn(mine.emails.organiser);
  const other: ApiClient = await signedIn(theirs.emails.organiser);
  const volunteer: ApiClient = await signedIn(mine.emails.volunteer);
  return { mine, theirs, organiser, other, volunteer, word };
});

async function search(c: ApiClient, q: string) {
  const res = await c.json<{ q: string; results: Hit[] }>("GET", `/api/search?q=${encodeURIComponent(q)}`);
  expect(res.status).toBe(200);
  return res.body.results;
}

const idsOf = (hits: Hit[]) => hits.map((h) => h.id);
const everyIdOf = (g: OwnGroup) => [g.groupId, g.driveId, g.dropPointId, g.heaterId];

describe("search", () => {
  it("finds a drop point by a word of its access notes, as a link to it", async () => {
    const hits = await search(s.organiser, "marmalade");
    const point = hits.find((h) => h.kind === "dropPoint");
    expect(point).toMatchObject({ id: s.mine.dropPointId, title: "Quillfeather bakery porch", href: `/organise/drop-points/${s.mine.dropPointId}` });
  });

  it("never shows another group's records, whichever kind matched", async () => {
    for (const q of ["marmalade", "Quillfeather", "Wickmere", "search-theirs", "organiser of search"]) {
      const mine = idsOf(await search(s.organiser, q));
      const theirs = idsOf(await search(s.other, q));
      for (const id of everyIdOf(s.theirs)) expect(mine).not.toContain(id);
      for (const id of everyIdOf(s.mine)) expect(theirs).not.toContain(id);
    }
    // Both groups' people are named "organiser of search-…": each finds only their own.
    const people = (await search(s.organiser, "organiser of search")).filter((h) => h.kind === "member");
    expect(people.length).toBeGreaterThan(0);
    const theirEmails = Object.values(s.theirs.emails);
    const rows = await testDb()("users").whereIn("email", theirEmails).pluck("id");
    for (const p of people) expect(rows).not.toContain(p.id);
  });

  it("matches a misspelt word by trigram similarity", async () => {
    // "Quilfeather" (one l short) shares most trigrams with "Quillfeather" (pg_trgm's word_similarity).
    const hits = await search(s.organiser, "Quilfeather");
    expect(idsOf(hits)).toContain(s.mine.dropPointId);
    expect(idsOf(hits)).toContain(s.mine.heaterId);
  });

  it("finds ledger notes and people of the group only", async () => {
    const db = testDb();
    // A ledger line's note is written through the ledger's own writer: a haul with a note.
    const haul = await s.volunteer.json("POST", `/api/drives/${s.mine.driveId}/hauls`, { dropPointId: s.mine.dropPointId, bags: 1, note: "Sticky zebra-striped bags again" });
    expect(haul.status).toBe(201);
    const noted = await db("ledger_lines").where({ group_id: s.mine.groupId }).andWhere("note", "like", "%zebra%").first();
    expect(noted, "the haul's note is on its ledger line").toBeTruthy();
    const hits = await search(s.organiser, "zebra");
    expect(hits.some((h) => h.kind === "ledgerNote" && h.href === `/ledger?driveId=${s.mine.driveId}`)).toBe(true);
    expect((await search(s.other, "zebra")).some((h) => h.kind === "ledgerNote")).toBe(false);
  });

  it("treats % and _ as letters, not wildcards", async () => {
    expect(likePattern("50%_off")).toBe("%50\\%\\_off%");
    expect(await search(s.organiser, "%%")).toEqual([]);
  });

  it("is for organisers only and checks its input", async () => {
    expect((await s.volunteer.get("/api/search?q=porch")).status).toBe(403);
    expect((await s.organiser.get("/api/search?q=a")).status).toBe(422);
    expect((await s.organiser.get(`/api/search?q=${"x".repeat(101)}`)).status).toBe(422);
  });
});
