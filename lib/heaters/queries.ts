import "server-only";
import type { Knex } from "knex";
import { db } from "@/lib/db";
import { notFound, AppError } from "@/lib/api/errors";
import { UUID } from "@/lib/api/path";
import { heaterClaims } from "@/lib/ledger/balances";
import { computeCanGrid } from "./can-grid";
import { unitNeed } from "./need";
import { planColumns } from "./plan-columns";
import { fromMm, toMm, type LengthUnit, type ResolvedCanGridInput } from "./schemas";
import type { HeaterState } from "./unit-schemas";
import type { HeaterSummary, SavedHeater } from "./types";

// Every query takes the acting group and filters by it in SQL: another
// group's unit is simply not found.

export interface HeaterUnitRow extends SavedHeater {
  id: string;
  name: string;
  driveId: string | null;
  driveName: string | null;
  driveSlug: string | null;
  builderId: string | null;
  builderName: string | null;
  /** The unit's share of its drive's spare allowance in cans, 0 without a drive (db/functions/unit_need.sql: unit_spare). */
  spare: number;
  unit: LengthUnit;
  coverage: "chamber" | "full";
  glazingWidth: number;
  glazingHeight: number;
  // The plan as saved, every length resolved when it was written (migration 20261218010000):
  // no default is filled in on reading, so a later change of a default leaves saved units alone.
  manifoldHeight: number;
  canDiameter: number;
  canLength: number;
  edgeClearance: number;
  holesPerCan: number;
  frameAllowanceWidth: number;
  frameAllowanceHeight: number;
  columns: number;
  rows: number;
  cans: number;
  state: HeaterState;
  notes: string;
  createdAt: string;
  stateChangedAt: string;
  /** Set while the unit is archived (issue 16): hidden from lists, counted toward no target. */
  archivedAt: string | null;
}

function unitColumns(q: Knex.QueryBuilder) {
  return q
    .leftJoin("drives as d", function () {
      this.on("d.id", "=", "h.drive_id").andOn("d.group_id", "=", "h.group_id");
    })
    .leftJoin("users as u", "u.id", "h.builder_id")
    .select(
      "h.id",
      "h.name",
      "h.drive_id as driveId",
      "d.name as driveName",
      "d.slug as driveSlug",
      "h.builder_id as builderId",
      "u.name as builderName",
      db.raw('unit_spare(h.cans, d.spare_percent)::int as "spare"'),
      "h.unit",
      "h.coverage",
      "h.glazing_width as glazingWidth",
      "h.glazing_height as glazingHeight",
      "h.manifold_height as manifoldHeight",
      "h.can_diameter as canDiameter",
      "h.can_length as canLength",
      "h.edge_clearance as edgeClearance",
      "h.holes_per_can as holesPerCan",
      "h.frame_allowance_width as frameAllowanceWidth",
      "h.frame_allowance_height as frameAllowanceHeight",
      "h.columns",
      "h.rows",
      "h.cans",
      "h.state",
      "h.notes",
      "h.created_at as createdAt",
      "h.state_changed_at as stateChangedAt",
      "h.archived_at as archivedAt",
    );
}

export async function listHeaterUnits(groupId: string, driveId?: string, archived = false): Promise<HeaterUnitRow[]> {
  return unitColumns(db("heater_units as h"))
    .where("h.group_id", groupId)
    .modify((q) => {
      if (driveId) q.andWhere("h.drive_id", driveId);
      if (archived) q.whereNotNull("h.archived_at");
      else q.whereNull("h.archived_at");
    })
    .orderBy([{ column: "h.created_at" }, { column: "h.name" }]);
}

export async function getHeaterUnit(groupId: string, id: string): Promise<HeaterUnitRow> {
  if (!UUID.test(id)) throw notFound("That heater unit");
  const row = await unitColumns(db("heater_units as h")).where({ "h.group_id": groupId, "h.id": id }).first();
  if (!row) throw notFound("That heater unit");
  return row;
}

/**
 * The unit's plan as saved, in `unit` when given (the group's units on its pages and
 * sheets: a plan saved in inches reads in millimetres for a metric group). Every value
 * is the stored one; none is defaulted here.
 */
export function planOf(u: Pick<HeaterUnitRow, keyof ResolvedCanGridInput>, unit: LengthUnit = u.unit): ResolvedCanGridInput {
  const len = (v: number) => (unit === u.unit ? v : fromMm(toMm(v, u.unit), unit));
  return {
    glazingWidth: len(u.glazingWidth),
    glazingHeight: len(u.glazingHeight),
    unit,
    coverage: u.coverage,
    manifoldHeight: len(u.manifoldHeight),
    canDiameter: len(u.canDiameter),
    canLength: len(u.canLength),
    edgeClearance: len(u.edgeClearance),
    holesPerCan: u.holesPerCan,
    frameAllowanceWidth: len(u.frameAllowanceWidth),
    frameAllowanceHeight: len(u.frameAllowanceHeight),
  };
}

export async function listGroupDrives(groupId: string) {
  return db("drives")
    .select(
      "id",
      "name",
      "slug",
      db.raw("spare_percent::float as \"sparePercent\""),
      "starts_on as startsOn",
      "ends_on as endsOn",
    )
    .where({ group_id: groupId })
    .whereNull("archived_at")
    .orderBy([{ column: "starts_on", order: "desc" }, { column: "name" }]);
}

export async function createHeaterUnit(
  actor: { groupId: string; userId: string },
  input: { name: string; driveId: string; notes?: string; plan: ResolvedCanGridInput },
) {
  const drive = await db("drives").select("id").where({ id: input.driveId, group_id: actor.groupId }).first();
  if (!drive) {
    throw new AppError("not_found", "That drive was not found in your group.", {
      fields: { driveId: "Choose one of your group's drives" },
    });
  }
  // The counts are computed here, never taken from the client; the plan is stored
  // resolved (the schema filled in every blank), so reading it needs no default.
  const grid = computeCanGrid(input.plan);
  const [row] = await db("heater_units")
    .insert({
      group_id: actor.groupId,
      drive_id: drive.id,
      builder_id: actor.userId,
      name: input.name,
      ...planColumns(input.plan),
      columns: grid.columns,
      rows: grid.rows,
      cans: grid.cans,
      notes: input.notes ?? "",
    })
    .returning(["id"]);
  return getHeaterUnit(actor.groupId, row.id);
}

export async function groupLatitude(groupId: string): Promise<number | null> {
  const row = await db("groups").select("workshop_lat").where({ id: groupId }).first();
  return row?.workshop_lat ?? null;
}

const ARCHIVED_FILTER = { active: "h.archived_at is null", archived: "h.archived_at is not null", all: "true" } as const;

/** The contract's `GET /api/heaters`, plus each unit's need (cans + its spare share) and what it still needs. */
export async function listHeatersWithClaims(groupId: string, which: "active" | "archived" | "all" = "all"): Promise<HeaterSummary[]> {
  const [units, claims] = await Promise.all([
    db("heater_units as h")
      .leftJoin("drives as d", function () {
        this.on("d.id", "=", "h.drive_id").andOn("d.group_id", "=", "h.group_id");
      })
      // The unit's spare share from the rule the claim trigger enforces (db/functions/unit_need.sql).
      .select("h.id", "h.name", "h.drive_id", "h.builder_id", "h.cans", "h.state", "h.archived_at", db.raw("unit_spare(h.cans, d.spare_percent)::int as spare"))
      .where("h.group_id", groupId)
      .whereRaw(ARCHIVED_FILTER[which])
      .orderBy("h.created_at"),
    heaterClaims(groupId),
  ]);
  return units.map((u) => {
    const claimed = claims[u.id]?.claimed ?? 0;
    const builtIn = claims[u.id]?.builtIn ?? 0;
    const n = unitNeed(u.cans as number, u.spare as number, claimed, builtIn);
    return {
      id: u.id as string,
      name: u.name as string,
      driveId: u.drive_id as string | null,
      builderId: u.builder_id as string | null,
      cans: u.cans as number,
      claimed,
      builtIn,
      state: u.state as HeaterState,
      spare: n.spare,
      need: n.need,
      remaining: n.remaining,
      archived: u.archived_at !== null,
    };
  });
}
