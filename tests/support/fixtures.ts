import { forTheFile, testDb } from "./db";

// Ids of the demo scenario's records, looked up by their invented names so
// tests never hard-code generated ids.
export interface DemoFixture {
  demoGroupId: string;
  otherGroupId: string;
  demoDriveId: string;
  demoDriveSlug: string;
  otherDriveId: string;
  otherDriveSlug: string;
  demoDropPointId: string;
  otherDropPointId: string;
  demoHeaterId: string;
  otherHeaterId: string;
}

export async function demoFixture(): Promise<DemoFixture> {
  const db = testDb();
  const demo = await db("groups").where({ slug: "larkhollow-warm-rooms" }).first();
  const other = await db("groups").where({ slug: "brindle-quay-fixers" }).first();
  const drive = await db("drives").where({ slug: "larkhollow-winter-2026" }).first();
  const otherDrive = await db("drives").where({ slug: "brindle-quay-boatshed" }).first();
  const point = await db("drop_points").where({ drive_id: drive.id, name: "Larkhollow Library porch" }).first();
  const otherPoint = await db("drop_points").where({ drive_id: otherDrive.id }).first();
  const heater = await db("heater_units").where({ drive_id: drive.id, name: "Library reading room" }).first();
  const otherHeater = await db("heater_units").where({ drive_id: otherDrive.id }).first();
  return {
    demoGroupId: demo.id,
    otherGroupId: other.id,
    demoDriveId: drive.id,
    demoDriveSlug: drive.slug,
    otherDriveId: otherDrive.id,
    otherDriveSlug: otherDrive.slug,
    demoDropPointId: point.id,
    otherDropPointId: otherPoint.id,
    demoHeaterId: heater.id,
    otherHeaterId: otherHeater.id,
  };
}

/** The demo fixture for the whole test file (see forTheFile in db.ts). */
export const demoFixtureForFile = (): DemoFixture => forTheFile(demoFixture);
