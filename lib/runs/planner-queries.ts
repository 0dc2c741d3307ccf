import "server-only";
import { db } from "@/lib/db";
import { notFound } from "@/lib/api/errors";
import { rankSuggestions, type HaulSample, type Suggestion } from "./suggest";
import { recentHauls, latestFillReports } from "./activity-queries";
import type { PlannerPlace } from "./types";

export interface PlannerPoint extends Suggestion, PlannerPlace {}

export async function plannerDrives(groupId: string) {
  return db("drives")
    .select("id", "name", "slug", "starts_on as startsOn", "ends_on as endsOn")
    .where({ group_id: groupId })
    .orderBy([{ column: "ends_on", order: "desc" }, { column: "name" }]);
}

export async function groupWorkshop(groupId: string): Promise<{ lat: number; lng: number } | null> {
  const g = await db("groups").select("workshop_lat", "workshop_lng").where({ id: groupId }).first();
  return g && g.workshop_lat !== null && g.workshop_lng !== null ? { lat: g.workshop_lat, lng: g.workshop_lng } : null;
}

/** The drive's active drop points, most in need of a visit first. */
export async function suggestedStops(groupId: string, driveId: string, now = new Date()): Promise<PlannerPoint[]> {
  const drive = await db("drives").select("id").where({ id: driveId, group_id: groupId }).first();
  if (!drive) throw notFound("That drive");
  const points = await db("drop_points")
    .select("id", "name", "address", "lat", "lng", "hours", "capacity_bags as capacityBags", "opening_hours as openingHours")
    .where({ group_id: groupId, drive_id: driveId, active: true })
    .orderBy("name");
  const ids = points.map((p) => p.id as string);
  const [hauls, reports] = await Promise.all([recentHauls(groupId, ids), latestFillReports(groupId, ids)]);
  const ranked = rankSuggestions(
    points.map((p) => ({
      id: p.id,
      capacityBags: p.capacityBags,
      hauls: hauls.get(p.id) ?? ([] as HaulSample[]),
      latestFillReport: reports.get(p.id) ?? null,
    })),
    now,
  );
  const byId = new Map(points.map((p) => [p.id as string, p]));
  return ranked.map((s) => {
    const p = byId.get(s.id)!;
    return { ...s, name: p.name, address: p.address, lat: p.lat, lng: p.lng, hours: p.hours, capacityBags: p.capacityBags, openingHours: p.openingHours ?? [] };
  });
}

export interface PickupHistoryEntry {
  runId: string;
  plannedOn: string;
  status: "pending" | "logged" | "skipped" | "released";
  skipReason: string | null;
  haulId: string | null;
  haulBags: number | null;
  assigneeName: string | null;
}

/** Every run stop at each of the group's drop points, newest first, keyed by drop point. */
export async function pickupHistory(groupId: string) {
  const points = await db("drop_points as p")
    .join("drives as d", "d.id", "p.drive_id")
    .select("p.id", "p.name", "d.name as driveName")
    .where("p.group_id", groupId)
    .orderBy([{ column: "d.ends_on", order: "desc" }, { column: "p.name" }]);
  const stops = await db("pickup_run_stops as s")
    .join("pickup_runs as r", "r.id", "s.run_id")
    .leftJoin("users as u", "u.id", "r.assignee_id")
    .leftJoin("hauls as h", "h.id", "s.haul_id")
    .select(
      "h.bags as haulBags",
      "s.drop_point_id as dropPointId",
      "r.id as runId",
      "r.planned_on as plannedOn",
      "s.status",
      "s.skip_reason as skipReason",
      "s.haul_id as haulId",
      "u.name as assigneeName",
    )
    .where("s.group_id", groupId)
    .orderBy([{ column: "r.planned_on", order: "desc" }, { column: "s.position" }]);
  const byPoint = new Map<string, PickupHistoryEntry[]>();
  for (const { dropPointId, ...entry } of stops) {
    byPoint.set(dropPointId, [...(byPoint.get(dropPointId) ?? []), entry]);
  }
  return points.map((p) => ({ ...p, history: byPoint.get(p.id) ?? [] }));
}
