// Knex row types (how they are made: types/tables/accounts.d.ts): Drives, their drop points and what the public posts, heater units, pickup runs.
import "knex/types/tables";
import type { HeaterState } from "@/lib/heaters/unit-schemas";
import type { RunState, StopStatus } from "@/lib/runs/schemas";

declare module "knex/types/tables" {
  interface DrivesRow {
    id: string;
    group_id: string;
    slug: string;
    name: string;
    description: string;
    wanted: string;
    starts_on: string;
    ends_on: string;
    is_public: boolean;
    spare_percent: number;
    created_at: Date;
    updated_at: Date;
    /** Set while archived (migration 20261212010000). */
    archived_at: Date | null;
  }
  interface DropPointsRow {
    id: string;
    group_id: string;
    drive_id: string;
    name: string;
    address: string;
    lat: number;
    lng: number;
    hours: string;
    access_notes: string;
    host_name: string | null;
    host_phone: string | null;
    host_email: string | null;
    capacity_bags: number;
    active: boolean;
    created_at: Date;
    fill_cleared_at: Date | null;
    /** Set while archived (migration 20261212010000). */
    archived_at: Date | null;
  }
  interface PledgesRow {
    id: string;
    group_id: string;
    drive_id: string;
    drop_point_id: string;
    name: string | null;
    email: string | null;
    bags: number;
    bring_on: string;
    created_at: Date;
    /** SHA-256 of the donor's cancel token (migration 20261207020000). */
    cancel_token_hash: string | null;
    status: "pledged" | "cancelled" | "received" | "notBrought";
    status_at: Date | null;
    haul_id: string | null;
    /** Set while archived (migration 20261212010000). */
    archived_at: Date | null;
  }
  interface PledgeConfirmationsRow {
    group_id: string;
    drive_id: string;
    address_hash: string;
    day: string;
    created_at: Date;
  }
  interface FillReportsRow {
    id: string;
    group_id: string;
    drop_point_id: string;
    level: number;
    note: string;
    photo_file_id: string | null;
    alerted: boolean;
    created_at: Date;
    /** Set while archived (migration 20261212010000). */
    archived_at: Date | null;
  }
  interface HeaterUnitsRow {
    id: string;
    group_id: string;
    drive_id: string | null;
    builder_id: string | null;
    name: string;
    unit: string;
    coverage: string;
    glazing_width: number;
    glazing_height: number;
    /** The plan's lengths are stored resolved, never NULL (migration 20261218010000). */
    manifold_height: number;
    can_diameter: number;
    can_length: number;
    edge_clearance: number;
    holes_per_can: number;
    columns: number;
    rows: number;
    cans: number;
    state: HeaterState;
    created_at: Date;
    frame_allowance_width: number;
    frame_allowance_height: number;
    notes: string;
    state_changed_at: Date;
    /** Set while archived (migration 20261207010000). */
    archived_at: Date | null;
  }
  interface PickupRunsRow {
    id: string;
    group_id: string;
    drive_id: string;
    planned_on: string;
    start_lat: number;
    start_lng: number;
    return_to_start: boolean;
    distance_km: number;
    assignee_id: string | null;
    state: RunState;
    notes: string;
    created_by: string | null;
    created_at: Date;
    started_at: Date | null;
    finished_at: Date | null;
  }
  interface PickupRunStopsRow {
    id: string;
    run_id: string;
    group_id: string;
    drop_point_id: string;
    position: number;
    leg_km: number;
    status: StopStatus;
    skip_reason: string | null;
    haul_id: string | null;
    resolved_by: string | null;
    resolved_at: Date | null;
  }
  interface Tables {
    drives: DrivesRow;
    drop_points: DropPointsRow;
    pledges: PledgesRow;
    pledge_confirmations: PledgeConfirmationsRow;
    fill_reports: FillReportsRow;
    heater_units: HeaterUnitsRow;
    pickup_runs: PickupRunsRow;
    pickup_run_stops: PickupRunStopsRow;
  }
}
