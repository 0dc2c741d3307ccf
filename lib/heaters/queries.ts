import "server-only";
import { db } from "@/lib/db";

export async function listHeaterUnitsSummary(groupId: string) {
  return db("heater_units")
    .select("id", "name", "cans", "columns", "rows", "state", "drive_id as driveId")
    .where({ group_id: groupId })
    .orderBy("created_at");
}
