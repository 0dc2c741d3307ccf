import "server-only";
import { db } from "@/lib/db";
import { env } from "@/lib/env";
import { groupLook } from "@/lib/format/group-look-queries";
import { runReminderMail, type ReminderStop } from "./mails";
import { linksFor, sendOnce } from "./send";

/** Reminders go out from this hour (group's clock) of the day before the run. */
export const REMINDER_FROM_HOUR = 8;

interface DueRun {
  runId: string;
  groupId: string;
  plannedOn: string;
  notes: string;
  driveName: string;
  userId: string;
  email: string;
  userName: string;
}

/**
 * Runs still planned for the group's "tomorrow" at `now`, once the group's
 * clock has passed REMINDER_FROM_HOUR, whose volunteer (still a member, address
 * proven, reminders on) has not been reminded of this run on this date.
 */
async function dueRuns(now: Date, groupIds?: readonly string[]): Promise<DueRun[]> {
  const { rows } = await db.raw(
    `select r.id as "runId", r.group_id as "groupId", r.planned_on as "plannedOn", r.notes, d.name as "driveName",
            u.id as "userId", u.email::text as email, u.name as "userName"
       from pickup_runs r
       join groups g on g.id = r.group_id
       join drives d on d.id = r.drive_id and d.group_id = r.group_id
       join memberships m on m.group_id = r.group_id and m.user_id = r.assignee_id
       join users u on u.id = r.assignee_id
      where r.state = 'planned'
        and u.email_verified_at is not null
        and r.planned_on = (((:now)::timestamptz at time zone g.time_zone)::date + 1)
        and extract(hour from ((:now)::timestamptz at time zone g.time_zone)) >= :hour
        and (:all or r.group_id = any((:groups)::uuid[]))
        and not exists (select 1 from notification_optouts o where o.user_id = u.id and o.kind = 'runReminder')
        and not exists (select 1 from notification_sends s where s.kind = 'runReminder'
                         and s.key = r.id::text || ':' || u.id::text || ':' || r.planned_on::text)
      order by r.planned_on, r.id`,
    { now: now.toISOString(), hour: REMINDER_FROM_HOUR, all: !groupIds, groups: groupIds ?? [] },
  );
  return rows as DueRun[];
}

async function stopsOf(runId: string, groupId: string): Promise<ReminderStop[]> {
  return db("pickup_run_stops as s")
    .join("drop_points as p", "p.id", "s.drop_point_id")
    .select("p.name", "p.address", "p.hours", "p.opening_hours as openingHours", "p.access_notes as accessNotes", "p.host_name as hostName", "p.host_phone as hostPhone", db.raw(`p.host_email::text as "hostEmail"`))
    .where({ "s.run_id": runId, "s.group_id": groupId })
    .orderBy("s.position");
}

export async function sendRunReminders(now: Date, groupIds?: readonly string[]): Promise<number> {
  let sent = 0;
  for (const run of await dueRuns(now, groupIds)) {
    const [look, stops] = await Promise.all([groupLook(run.groupId), stopsOf(run.runId, run.groupId)]);
    const mail = runReminderMail({
      look,
      links: linksFor(run.userId, "runReminder"),
      runUrl: `${env().APP_URL.replace(/\/$/, "")}/runs/${run.runId}`,
      volunteerName: run.userName,
      driveName: run.driveName,
      plannedOn: run.plannedOn,
      notes: run.notes,
      stops,
    });
    const key = `${run.runId}:${run.userId}:${run.plannedOn}`;
    if (await sendOnce({ kind: "runReminder", key, groupId: run.groupId, to: { userId: run.userId, email: run.email }, mail })) sent += 1;
  }
  return sent;
}
