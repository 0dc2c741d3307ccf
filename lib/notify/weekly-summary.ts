import "server-only";
import { db } from "@/lib/db";
import { env } from "@/lib/env";
import { listFullBins } from "@/lib/drives/fill-queries";
import { addDays } from "@/lib/drives/progress";
import { unitCansOf } from "@/lib/drives/public-queries";
import { progressFor } from "@/lib/drives/tallies";
import { localDay } from "@/lib/format";
import { groupLook } from "@/lib/format/group-look-queries";
import { weeklySummaryMail, type SummaryDrive } from "./mails";
import { linksFor, sendOnce } from "./send";

/** The summary for a week goes out from Monday at this hour (group's clock), or at the first sweep after. */
export const SUMMARY_FROM_HOUR = 8;

interface DueOrganiser {
  groupId: string;
  groupName: string;
  weekOf: string;
  userId: string;
  email: string;
  userName: string;
}

/** Organisers (address proven, summary on) not yet sent the summary of the group's current week (ISO: from Monday). */
async function dueOrganisers(now: Date, groupIds?: readonly string[]): Promise<DueOrganiser[]> {
  const { rows } = await db.raw(
    `with here as (
       select g.id, g.name, ((:now)::timestamptz at time zone g.time_zone) as clock from groups g
        where (:all or g.id = any((:groups)::uuid[])))
     select h.id as "groupId", h.name as "groupName", date_trunc('week', h.clock)::date::text as "weekOf",
            u.id as "userId", u.email::text as email, u.name as "userName"
       from here h
       join memberships m on m.group_id = h.id and m.role = 'organiser'
       join users u on u.id = m.user_id
      where u.email_verified_at is not null
        and not (extract(isodow from h.clock) = 1 and extract(hour from h.clock) < :hour)
        and not exists (select 1 from notification_optouts o where o.user_id = u.id and o.kind = 'weeklySummary')
        and not exists (select 1 from notification_sends s where s.kind = 'weeklySummary'
                         and s.key = h.id::text || ':' || u.id::text || ':' || date_trunc('week', h.clock)::date::text)
      order by h.id, u.id`,
    { now: now.toISOString(), hour: SUMMARY_FROM_HOUR, all: !groupIds, groups: groupIds ?? [] },
  );
  return rows as DueOrganiser[];
}

/** The drives running on the group's `today`, each with its progress, full bins and the pledges due in the next 7 days. */
async function summaryDrives(groupId: string, today: string): Promise<SummaryDrive[]> {
  const drives = await db("drives")
    .select("id", "name", "starts_on", "ends_on", "spare_percent")
    .where({ group_id: groupId })
    .whereNull("archived_at")
    .andWhere("starts_on", "<=", today)
    .andWhere("ends_on", ">=", today)
    .orderBy("starts_on");
  return Promise.all(
    drives.map(async (d) => {
      const [progress, bins, pledges] = await Promise.all([
        progressFor({ id: d.id, startsOn: d.starts_on, endsOn: d.ends_on, sparePercent: d.spare_percent }, await unitCansOf(d.id, groupId), today),
        listFullBins(groupId, d.id),
        db("pledges as pl")
          .join("drop_points as p", "p.id", "pl.drop_point_id")
          .select("p.name as dropPointName", "pl.bags", "pl.bring_on as bringOn")
          // Only pledges still open: a donor's cancel or an organiser's mark ends one.
          .where({ "pl.group_id": groupId, "pl.drive_id": d.id, "pl.status": "pledged" })
          .whereNull("pl.archived_at")
          .andWhere("pl.bring_on", ">=", today)
          .andWhere("pl.bring_on", "<", addDays(today, 7))
          .orderBy([{ column: "pl.bring_on" }, { column: "p.name" }]),
      ]);
      return {
        name: d.name,
        goodCans: progress.goodCans,
        targetCans: progress.target.cans,
        remaining: progress.remaining,
        fullBins: bins.map((b) => b.dropPointName),
        pledgesDue: pledges as SummaryDrive["pledgesDue"],
      };
    }),
  );
}

async function runsDone(groupId: string, now: Date) {
  return db("pickup_runs as r")
    .join("drives as d", "d.id", "r.drive_id")
    .leftJoin("users as u", "u.id", "r.assignee_id")
    .select("d.name as driveName", "r.planned_on as plannedOn", "u.name as volunteerName", db.raw(`(select count(*)::int from pickup_run_stops s where s.run_id = r.id) as stops`))
    .where({ "r.group_id": groupId, "r.state": "done" })
    .andWhere("r.finished_at", ">", new Date(now.getTime() - 7 * 86_400_000))
    .andWhere("r.finished_at", "<=", now)
    .orderBy("r.planned_on") as Promise<{ driveName: string; plannedOn: string; volunteerName: string | null; stops: number }[]>;
}

export async function sendWeeklySummaries(now: Date, groupIds?: readonly string[]): Promise<number> {
  const due = await dueOrganisers(now, groupIds);
  const perGroup = new Map<string, Promise<{ drives: SummaryDrive[]; runs: Awaited<ReturnType<typeof runsDone>>; look: Awaited<ReturnType<typeof groupLook>> }>>();
  const contentOf = (groupId: string) => {
    let content = perGroup.get(groupId);
    if (!content) {
      content = (async () => {
        const look = await groupLook(groupId);
        const today = localDay(now, look.timeZone);
        const [drives, runs] = await Promise.all([summaryDrives(groupId, today), runsDone(groupId, now)]);
        return { drives, runs, look };
      })();
      perGroup.set(groupId, content);
    }
    return content;
  };
  let sent = 0;
  for (const o of due) {
    const { drives, runs, look } = await contentOf(o.groupId);
    const mail = weeklySummaryMail({
      look,
      links: linksFor(o.userId, "weeklySummary"),
      dashboardUrl: `${env().APP_URL.replace(/\/$/, "")}/dashboard`,
      organiserName: o.userName,
      groupName: o.groupName,
      weekOf: o.weekOf,
      drives,
      runsDone: runs,
    });
    const key = `${o.groupId}:${o.userId}:${o.weekOf}`;
    if (await sendOnce({ kind: "weeklySummary", key, groupId: o.groupId, to: { userId: o.userId, email: o.email }, mail })) sent += 1;
  }
  return sent;
}
