import "server-only";
import { db } from "@/lib/db";
import { env } from "@/lib/env";
import { groupLook } from "@/lib/format/group-look-queries";
import { unitNeed } from "@/lib/heaters/need";
import { unitReadyMail } from "./mails";
import { linksFor, sendOnce } from "./send";

interface Candidate {
  unitId: string;
  groupId: string;
  unitName: string;
  cans: number;
  /** The unit's spare share in cans (unit_spare, db/functions/unit_need.sql). */
  spare: number;
  driveName: string;
  userId: string;
  email: string;
  userName: string;
  unitClaimed: number;
  unitBuiltIn: number;
  punched: number;
  driveClaimed: number;
}

/**
 * Units still gathering cans (planned or claiming) whose builder (still a
 * member, address proven, note on) has never had this note, with the running
 * totals the rule needs: the unit's claimed and built-in cans, and the drive's
 * punched and claimed cans (drive-level rows of stage_balances).
 */
async function candidates(groupIds?: readonly string[]): Promise<Candidate[]> {
  const { rows } = await db.raw(
    `select h.id as "unitId", h.group_id as "groupId", h.name as "unitName", h.cans, unit_spare(h.cans, d.spare_percent)::int as spare,
            d.name as "driveName", u.id as "userId", u.email::text as email, u.name as "userName",
            coalesce((select sum(b.quantity) from stage_balances b where b.heater_unit_id = h.id and b.stage = 'claimed'), 0)::int as "unitClaimed",
            coalesce((select sum(b.quantity) from stage_balances b where b.heater_unit_id = h.id and b.stage = 'builtIn'), 0)::int as "unitBuiltIn",
            coalesce((select b.quantity from stage_balances b where b.drive_id = d.id and b.drop_point_id is null and b.heater_unit_id is null and b.stage = 'punched'), 0)::int as punched,
            coalesce((select b.quantity from stage_balances b where b.drive_id = d.id and b.drop_point_id is null and b.heater_unit_id is null and b.stage = 'claimed'), 0)::int as "driveClaimed"
       from heater_units h
       join drives d on d.id = h.drive_id and d.group_id = h.group_id
       join memberships m on m.group_id = h.group_id and m.user_id = h.builder_id
       join users u on u.id = h.builder_id
      where h.state in ('planned', 'claiming') and h.archived_at is null
        and u.email_verified_at is not null
        and (:all or h.group_id = any((:groups)::uuid[]))
        and not exists (select 1 from notification_optouts o where o.user_id = u.id and o.kind = 'unitReady')
        and not exists (select 1 from notification_sends s where s.kind = 'unitReady' and s.key = h.id::text)
      order by h.created_at, h.id`,
    { all: !groupIds, groups: groupIds ?? [] },
  );
  return rows as Candidate[];
}

/**
 * Punched cans nobody has claimed: a claim reserves cans of the drive whatever
 * their stage, so the punched ones count as free only beyond every claim.
 * Never more than what the drive could still give (its `unclaimed`, which is at least this).
 */
export function readyPunched(punched: number, driveClaimed: number): number {
  return Math.max(0, punched - driveClaimed);
}

/** One note per unit, the first time the drive's unclaimed punched cans cover what the unit still needs. */
export async function sendUnitReadyNotes(groupIds?: readonly string[]): Promise<number> {
  let sent = 0;
  for (const c of await candidates(groupIds)) {
    const { remaining } = unitNeed(c.cans, c.spare, c.unitClaimed, c.unitBuiltIn);
    const ready = readyPunched(c.punched, c.driveClaimed);
    if (remaining <= 0 || ready < remaining) continue;
    const mail = unitReadyMail({
      look: await groupLook(c.groupId),
      links: linksFor(c.userId, "unitReady"),
      unitUrl: `${env().APP_URL.replace(/\/$/, "")}/units/${c.unitId}`,
      builderName: c.userName,
      unitName: c.unitName,
      driveName: c.driveName,
      remaining,
      readyPunched: ready,
    });
    if (await sendOnce({ kind: "unitReady", key: c.unitId, groupId: c.groupId, to: { userId: c.userId, email: c.email }, mail })) sent += 1;
  }
  return sent;
}
