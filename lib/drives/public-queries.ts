import "server-only";
import { db } from "@/lib/db";
import { publicRead } from "@/lib/db-read";
import { notFound } from "@/lib/api/errors";
import { UUID } from "@/lib/api/path";
import { CURRENT_FILL_LATERAL } from "./fill";
import type { PublicDropPointRow, PublicDropPointWithTallies } from "./types";
import type { Look } from "@/lib/format/look";

export type { PublicDropPointRow, PublicDropPointWithTallies };

export interface PublicDriveSummary {
  slug: string;
  name: string;
  startsOn: string;
  endsOn: string;
}

// Dates leave as plain YYYY-MM-DD strings (knexfile.ts's date parser), never shifted by a time zone.
const publicDriveColumns = ["slug", "name", "starts_on as startsOn", "ends_on as endsOn"] as const;

// The reads a stranger's pages make go through publicRead (lib/db-read.ts): to the read
// replica when it has every write this server knows of, else to the primary.
export async function listPublicDrives(): Promise<PublicDriveSummary[]> {
  return publicRead((db) =>
    db("drives")
      .select(...publicDriveColumns)
      .where({ is_public: true })
      .whereNull("archived_at")
      .orderBy([{ column: "starts_on", order: "desc" }, { column: "name" }]),
  );
}

/** The landing page's list: every public drive with its group's name and the group's own calendar day now. */
export async function listPublicDrivesWithDay(): Promise<(PublicDriveSummary & { groupName: string; today: string })[]> {
  return publicRead((db) => db("drives as d")
    .join("groups as g", "g.id", "d.group_id")
    .select(
      "d.slug",
      "d.name",
      "g.name as groupName",
      "d.starts_on as startsOn",
      "d.ends_on as endsOn",
      db.raw(`(now() at time zone g.time_zone)::date as "today"`),
    )
    .where({ "d.is_public": true })
    .whereNull("d.archived_at")
    .orderBy([{ column: "d.name" }]));
}

/** The time zone of the group running a public drive (for showing times as the group reads them). */
export async function publicDriveTimeZone(slug: string): Promise<string> {
  const row = await publicRead((db) => db("drives as d").join("groups as g", "g.id", "d.group_id").select("g.time_zone as timeZone").where({ "d.slug": slug, "d.is_public": true }).whereNull("d.archived_at").first());
  return (row?.timeZone as string | undefined) ?? "UTC";
}

export interface PublicDriveRow extends PublicDriveSummary {
  id: string;
  groupId: string;
  groupName: string;
  description: string;
  wanted: string;
  sparePercent: number;
  /** The group's look (lib/format): its day for the pace, its words for dates and measures. */
  look: Look;
}

export async function findPublicDrive(slug: string): Promise<PublicDriveRow | undefined> {
  const row = await publicRead((db) => db("drives as d")
    .join("groups as g", "g.id", "d.group_id")
    .select(
      "d.id",
      "d.group_id as groupId",
      "g.name as groupName",
      "g.time_zone as timeZone",
      "g.locale",
      "g.units",
      "d.slug",
      "d.name",
      "d.description",
      "d.wanted",
      "d.spare_percent as sparePercent",
      "d.starts_on as startsOn",
      "d.ends_on as endsOn",
    )
    .where({ "d.slug": slug, "d.is_public": true })
    .whereNull("d.archived_at")
    .first());
  if (!row) return undefined;
  const { timeZone, locale, units, ...rest } = row;
  return { ...rest, look: { timeZone, locale, units } };
}

/** Cans each heater unit of the drive needs, oldest unit first; an archived unit counts for nothing. */
export async function unitCansOf(driveId: string, groupId: string, from: "public" | "primary" = "primary"): Promise<number[]> {
  const read = from === "public" ? publicRead : <T>(run: (q: typeof db) => PromiseLike<T>) => Promise.resolve(run(db));
  const rows = await read((db) =>
    db("heater_units").select("cans").where({ drive_id: driveId, group_id: groupId }).whereNull("archived_at").orderBy([{ column: "created_at" }, { column: "name" }]),
  );
  return rows.map((r) => r.cans);
}

/**
 * The public map's whole answer in one round trip: the drive (by slug, public
 * only), its active drop points, their last fill report, photos and the
 * ledger's running tallies. The busiest public read, so kept to one query.
 */
export async function listPublicDropPointsWithTallies(slug: string): Promise<PublicDropPointWithTallies[]> {
  const { rows } = await publicRead((db) => db.raw(
    `select p.id, p.name, p.address, p.lat, p.lng, p.hours, p.capacity_bags as "capacityBags",
            f.level as "fillLevel", f.created_at as "fillReportedAt", cf.fill_level, cf.fill_at,
            coalesce((select array_agg(fi.url order by fi.created_at) from files fi
                       where fi.purpose = 'drop-point-photo' and fi.subject_id = p.id and fi.group_id = p.group_id and fi.archived_at is null), '{}') as photos,
            coalesce(t.hauls, 0)::int as hauls, coalesce(t.bags, 0)::int as bags,
            coalesce(t.good_cans, 0)::bigint as "goodCans", coalesce(t.rejected_cans, 0)::bigint as "rejectedCans"
       from drives d
       join drop_points p on p.drive_id = d.id and p.active and p.archived_at is null
       left join drop_point_tallies t on t.drop_point_id = p.id
       left join lateral (select level, created_at from fill_reports fr where fr.drop_point_id = p.id and fr.archived_at is null
                           order by fr.created_at desc limit 1) f on true
       ${CURRENT_FILL_LATERAL}
      where d.slug = ? and d.is_public and d.archived_at is null
      order by p.name`,
    [slug],
  ));
  return rows.map((r: Record<string, unknown>) => ({
    id: r.id as string,
    name: r.name as string,
    address: r.address as string,
    lat: r.lat as number,
    lng: r.lng as number,
    hours: r.hours as string,
    capacityBags: r.capacityBags as number,
    fillLevel: (r.fillLevel as number | null) ?? null,
    fillReportedAt: r.fillReportedAt ? new Date(r.fillReportedAt as string).toISOString() : null,
    fill: r.fill_level === null || r.fill_level === undefined ? null : { level: r.fill_level as number, reportedAt: new Date(r.fill_at as string).toISOString() },
    photos: r.photos as string[],
    tallies: { hauls: r.hauls as number, bags: r.bags as number, goodCans: r.goodCans as number, rejectedCans: r.rejectedCans as number },
  }));
}

// The two lookups below come before a stranger's write (a pledge, a fill report), so they stay on the primary.

/** Undefined for an id that is not a UUID: PostgreSQL would refuse to compare it. */
export async function findPublicDropPoint(driveId: string, id: string) {
  if (!UUID.test(id)) return undefined;
  return db("drop_points").select("id", "group_id as groupId", "name", "hours", "fill_cleared_at as fillClearedAt").where({ id, drive_id: driveId, active: true }).whereNull("archived_at").first();
}

/** A public drive's id by its slug; 404 when there is none. */
export async function publicDriveId(slug: string): Promise<string> {
  const drive = await db("drives").select("id").where({ slug, is_public: true }).whereNull("archived_at").first();
  if (!drive) throw notFound("That drive");
  return drive.id;
}

// The organiser's ledger list lives in ./ledger-list (paging, order, undo links).
