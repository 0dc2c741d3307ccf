import "server-only";
import { db } from "@/lib/db";
import { ROLE_LABEL, type Role } from "@/lib/auth/roles";
import type { SearchHit, SearchKind } from "./schemas";

// One search over the acting group's drives, drop points, heater units,
// members and ledger notes. Each part filters by the group in SQL (the
// trigram indexes of migration 20261208010000 lead with group_id) and matches
// either the text as typed anywhere (ILIKE, served by pg_trgm) or a word close
// to it (pg_trgm's word similarity, `<%`), best match first.

const PER_KIND = 8;

/** ILIKE's own wildcards in what was typed are matched as themselves. */
export function likePattern(q: string): string {
  return `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

// The same expressions as the indexes, so PostgreSQL can use them.
const TEXT: Record<Exclude<SearchKind, "member" | "ledgerNote">, string> = {
  drive: "(x.name || ' ' || x.description)",
  dropPoint: "(x.name || ' ' || x.address || ' ' || x.hours || ' ' || x.access_notes || ' ' || coalesce(x.host_name, ''))",
  heaterUnit: "(x.name || ' ' || x.notes)",
};

const matches = (expr: string) => `(${expr} ilike :pattern or :q <% ${expr})`;
const rank = (expr: string) => `word_similarity(:q, ${expr})`;

/** A few words around the first place the text matched, for the result's second line. */
export function snippet(text: string, q: string, width = 90): string {
  const flat = text.replace(/\s+/g, " ").trim();
  const at = flat.toLowerCase().indexOf(q.toLowerCase());
  if (flat.length <= width) return flat;
  let start = at < 0 ? 0 : Math.max(0, at - Math.floor(width / 3));
  // Begin at a word, never in the middle of one.
  if (start > 0) {
    const space = flat.indexOf(" ", start);
    start = space >= 0 && space < (at < 0 ? flat.length : at) ? space + 1 : start;
  }
  const piece = flat.slice(start, start + width);
  return `${start > 0 ? "…" : ""}${piece}${start + width < flat.length ? "…" : ""}`;
}

interface PointRow {
  drive: string;
  address: string;
  hours: string;
  notes: string;
  host: string | null;
}

/** The drive, address and hours, and the notes or host where the words were found there. */
function pointDetail(r: PointRow, q: string): string {
  const has = (text: string | null) => !!text && text.toLowerCase().includes(q.toLowerCase());
  return [
    r.drive,
    r.address,
    r.hours,
    has(r.notes) ? `Notes: ${snippet(r.notes, q, 70)}` : null,
    has(r.host) ? `Host: ${r.host}` : null,
  ]
    .filter(Boolean)
    .join(" · ");
}

export async function searchGroup(groupId: string, q: string): Promise<SearchHit[]> {
  const b = { g: groupId, q, pattern: likePattern(q), n: PER_KIND };
  const [drives, points, units, people, notes] = await Promise.all([
    db.raw(
      `select x.id, x.name, x.description as detail from drives x
        where x.group_id = :g and ${matches(TEXT.drive)} order by ${rank(TEXT.drive)} desc, x.name limit :n`,
      b,
    ),
    db.raw(
      `select x.id, x.name, x.address, x.hours, x.access_notes as notes, x.host_name as host, d.name as drive
         from drop_points x join drives d on d.id = x.drive_id
        where x.group_id = :g and ${matches(TEXT.dropPoint)} order by ${rank(TEXT.dropPoint)} desc, x.name limit :n`,
      b,
    ),
    db.raw(
      `select x.id, x.name, x.notes as detail, x.cans from heater_units x
        where x.group_id = :g and ${matches(TEXT.heaterUnit)} order by ${rank(TEXT.heaterUnit)} desc, x.name limit :n`,
      b,
    ),
    db.raw(
      `select u.id, u.name, u.email::text as email, m.role from memberships m join users u on u.id = m.user_id
        where m.group_id = :g and (u.name ilike :pattern or u.email::text ilike :pattern or :q <% u.name)
        order by word_similarity(:q, u.name) desc, u.name limit :n`,
      b,
    ),
    db.raw(
      `select l.id, l.note, l.drive_id, l.occurred_at, d.name as drive from ledger_lines l join drives d on d.id = l.drive_id
        where l.group_id = :g and l.note <> '' and (l.note ilike :pattern or :q <% l.note)
        order by word_similarity(:q, l.note) desc, l.id desc limit :n`,
      b,
    ),
  ]);
  type Row = Record<string, string | number | Date>;
  const rows = (r: { rows: Row[] }) => r.rows;
  return [
    ...rows(drives).map((r) => ({ kind: "drive" as const, id: String(r.id), title: String(r.name), detail: snippet(String(r.detail || "Drive"), q), href: `/organise/drives/${r.id}` })),
    ...rows(points).map((r) => ({ kind: "dropPoint" as const, id: String(r.id), title: String(r.name), detail: pointDetail(r as unknown as PointRow, q), href: `/organise/drop-points/${r.id}` })),
    ...rows(units).map((r) => ({ kind: "heaterUnit" as const, id: String(r.id), title: String(r.name), detail: r.detail ? snippet(String(r.detail), q) : `${r.cans} cans`, href: `/units/${r.id}` })),
    ...rows(people).map((r) => ({ kind: "member" as const, id: String(r.id), title: String(r.name), detail: `${r.email} · ${ROLE_LABEL[r.role as Role]}`, href: `/members#member-${r.id}` })),
    ...rows(notes).map((r) => ({ kind: "ledgerNote" as const, id: String(r.id), title: snippet(String(r.note), q, 70), detail: String(r.drive), href: `/ledger?driveId=${r.drive_id}` })),
  ];
}
