import type { Knex } from "knex";
import { planRoute } from "../../lib/runs/route-order";

// One planned pickup run of the demo group, given to the demo volunteer: the
// three winter drop points furthest from the workshop, ordered like the planner would.
export async function seed(knex: Knex): Promise<void> {
  const group = await knex("groups").where({ slug: "larkhollow-warm-rooms" }).first();
  const drive = await knex("drives").where({ slug: "larkhollow-winter-2026", group_id: group?.id }).first();
  const volunteer = await knex("users").where({ email: "volunteer@cantrove.test" }).first();
  const organiser = await knex("users").where({ email: "organiser@cantrove.test" }).first();
  if (!group || !drive || !volunteer || !organiser) return;
  const points = await knex("drop_points")
    .select("id", "lat", "lng")
    .where({ drive_id: drive.id })
    .whereIn("name", ["Hilltop Corner Shop", "Greenfold Allotments shed", "Quayside Community Hall"]);
  if (points.length === 0) return;
  if (group.workshop_lat === null || group.workshop_lng === null) return;
  const start = { lat: group.workshop_lat, lng: group.workshop_lng };
  const plan = planRoute({ start, stops: points, returnToStart: true });
  const [run] = await knex("pickup_runs")
    .insert({
      group_id: group.id,
      drive_id: drive.id,
      planned_on: "2026-12-05",
      start_lat: start.lat,
      start_lng: start.lng,
      return_to_start: true,
      distance_km: plan.distanceKm,
      assignee_id: volunteer.id,
      created_by: organiser.id,
      notes: "Saturday morning loop; the allotments shed is only open until 13:00.",
    })
    .returning("id");
  await knex("pickup_run_stops").insert(
    plan.order.map((id, i) => ({
      run_id: run.id,
      group_id: group.id,
      drop_point_id: id,
      position: i + 1,
      leg_km: plan.legs[i]!.km,
    })),
  );
}
