import "server-only";
import { db } from "@/lib/db";
import { listDrives, listPledges } from "./queries";
import { listFullBins } from "./fill-queries";
import { unitCansOf } from "./public-queries";
import { progressFor } from "./tallies";
import { byTimingOrder, driveTiming, type DriveTiming } from "./current-drive";
import { groupToday } from "./current-drive-queries";

const TIMING_ORDER: Record<DriveTiming, number> = { running: 0, upcoming: 1, ended: 2 };

/** What the organiser's home shows: each drive's progress, and what needs attention. */
export async function organiserDashboard(groupId: string) {
  const [all, day] = await Promise.all([listDrives(groupId), groupToday(groupId)]);
  const today = () => day;
  // What is running first, then what starts soonest, then what ended most recently.
  const drives = [...all].sort((a, b) => {
    const [ta, tb] = [driveTiming(a, day), driveTiming(b, day)];
    if (ta !== tb) return TIMING_ORDER[ta] - TIMING_ORDER[tb];
    return byTimingOrder(ta, a, b);
  });
  const spare = await db("drives").select("id", "spare_percent").where({ group_id: groupId });
  const spareOf = new Map(spare.map((d) => [d.id, d.spare_percent]));
  return Promise.all(
    drives.map(async (d) => {
      const [progress, fills, pledges] = await Promise.all([
        progressFor({ id: d.id, startsOn: d.startsOn, endsOn: d.endsOn, sparePercent: spareOf.get(d.id) ?? 5 }, await unitCansOf(d.id, groupId), today()),
        listFullBins(groupId, d.id),
        listPledges(groupId, d.id),
      ]);
      const upcoming = pledges.filter((p) => p.status === "pledged" && (!p.bringOn || p.bringOn >= today()));
      return { drive: d, progress, fullBins: fills, pledges: upcoming.slice(0, 5) };
    }),
  );
}
