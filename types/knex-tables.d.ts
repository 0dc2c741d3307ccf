// The row of each table as it comes back from PostgreSQL through Knex, with the
// type parsers of knexfile.ts: bigint and numeric as numbers, date as
// "YYYY-MM-DD" text, timestamptz as a Date, jsonb as parsed JSON (unknown: each
// reader says what it expects). Written from db/migrations; a migration that
// adds, drops or retypes a column changes its interface here.
// With these, db("table") rows and db("table").insert/update are typed; a
// join or an aliased table ("drives as d") still needs the caller to say what
// it selects. Columns with a CHECK list have that list's type.
import "knex/types/tables";
import type { Role } from "@/lib/auth/roles";
import type { HeaterState } from "@/lib/heaters/unit-schemas";
import type { RunState, StopStatus } from "@/lib/runs/schemas";

declare module "knex/types/tables" {
  interface DriveDailyGoodRow {
    drive_id: string;
    day: string;
    good_cans: number;
  }
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
  }
  interface DropPointTalliesRow {
    drop_point_id: string;
    group_id: string;
    drive_id: string;
    hauls: number;
    bags: number;
    good_cans: number;
    rejected_cans: number;
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
  }
  interface EmailVerificationsRow {
    id: string;
    user_id: string;
    token_hash: string;
    created_at: Date;
    expires_at: Date;
    used_at: Date | null;
  }
  interface FilesRow {
    id: string;
    group_id: string | null;
    uploaded_by: string | null;
    key: string;
    url: string;
    name: string;
    size: number;
    mime: string;
    purpose: string;
    subject_id: string | null;
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
  }
  interface GroupCalibrationRow {
    group_id: string;
    weight_hauls: number;
    weight_cans: number;
    weight_kg: number;
    bag_hauls: number;
    bag_cans: number;
    bags: number;
  }
  interface GroupsRow {
    id: string;
    slug: string;
    name: string;
    town: string | null;
    workshop_lat: number | null;
    workshop_lng: number | null;
    created_at: Date;
    time_zone: string;
  }
  interface HaulsRow {
    id: string;
    group_id: string;
    drive_id: string;
    drop_point_id: string;
    movement_id: string;
    bags: number;
    weight_kg: number | null;
    estimated_cans: number;
    estimate_method: string;
    estimate_per_unit: number;
    estimate_counted_hauls: number;
    hauled_at: Date;
    recorded_at: Date;
    recorded_by: string;
    sort_id: string | null;
    reversed_at: Date | null;
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
    manifold_height: number | null;
    can_diameter: number | null;
    can_length: number | null;
    edge_clearance: number | null;
    holes_per_can: number;
    columns: number;
    rows: number;
    cans: number;
    state: HeaterState;
    created_at: Date;
    frame_allowance_width: number | null;
    frame_allowance_height: number | null;
    notes: string;
    state_changed_at: Date;
  }
  interface IdempotencyKeysRow {
    actor_id: string;
    key: string;
    method: string;
    path: string;
    body_hash: string;
    status: number | null;
    response: unknown | null;
    created_at: Date;
  }
  interface InvitationsRow {
    id: string;
    group_id: string;
    email: string;
    role: Role;
    token_hash: string;
    invited_by: string | null;
    created_at: Date;
    sent_at: Date;
    expires_at: Date;
    accepted_at: Date | null;
    accepted_by: string | null;
    revoked_at: Date | null;
  }
  interface LedgerLinesRow {
    id: number;
    movement_id: string;
    group_id: string;
    drive_id: string;
    drop_point_id: string | null;
    heater_unit_id: string | null;
    from_stage: string | null;
    to_stage: string | null;
    quantity: number;
    reason: string | null;
    is_estimate: boolean;
    note: string;
    occurred_at: Date;
    recorded_at: Date;
    recorded_by: string;
    reverses_id: number | null;
    haul_id: string | null;
    sort_id: string | null;
  }
  interface MembershipsRow {
    group_id: string;
    user_id: string;
    role: Role;
    created_at: Date;
    current_drive_id: string | null;
  }
  interface MovementsRow {
    id: string;
    group_id: string;
    drive_id: string;
    kind: string;
    recorded_by: string;
    occurred_at: Date;
    recorded_at: Date;
    reverses_movement_id: string | null;
    details: unknown;
  }
  interface OutboxRow {
    id: number;
    group_id: string | null;
    to_address: string;
    subject: string;
    text_body: string;
    html_body: string | null;
    kind: string;
    status: string;
    attempts: number;
    last_error: string | null;
    created_at: Date;
    next_attempt_at: Date;
    sent_at: Date | null;
  }
  interface PasswordResetsRow {
    id: string;
    user_id: string;
    token_hash: string;
    created_at: Date;
    expires_at: Date;
    used_at: Date | null;
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
  interface PledgeConfirmationsRow {
    group_id: string;
    drive_id: string;
    address_hash: string;
    day: string;
    created_at: Date;
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
  }
  interface RateLimitsRow {
    key: string;
    points: number;
    expire: number | null;
  }
  interface RejectTalliesRow {
    group_id: string;
    drive_id: string;
    drop_point_id: string | null;
    reason: string;
    quantity: number;
  }
  interface SortsRow {
    id: string;
    group_id: string;
    drive_id: string;
    movement_id: string;
    good: number;
    rejected: unknown;
    counted: number;
    haul_count: number;
    bags: number;
    weight_kg: number | null;
    sorted_at: Date;
    recorded_at: Date;
    recorded_by: string;
    reversed_at: Date | null;
  }
  interface StageBalancesRow {
    group_id: string;
    drive_id: string;
    drop_point_id: string | null;
    heater_unit_id: string | null;
    stage: string;
    quantity: number;
  }
  interface UsersRow {
    id: string;
    email: string;
    name: string;
    password_hash: string | null;
    created_at: Date;
    email_verified_at: Date | null;
    session_version: number;
  }

  interface Tables {
    drive_daily_good: DriveDailyGoodRow;
    drives: DrivesRow;
    drop_point_tallies: DropPointTalliesRow;
    drop_points: DropPointsRow;
    email_verifications: EmailVerificationsRow;
    files: FilesRow;
    fill_reports: FillReportsRow;
    group_calibration: GroupCalibrationRow;
    groups: GroupsRow;
    hauls: HaulsRow;
    heater_units: HeaterUnitsRow;
    idempotency_keys: IdempotencyKeysRow;
    invitations: InvitationsRow;
    ledger_lines: LedgerLinesRow;
    memberships: MembershipsRow;
    movements: MovementsRow;
    outbox: OutboxRow;
    password_resets: PasswordResetsRow;
    pickup_run_stops: PickupRunStopsRow;
    pickup_runs: PickupRunsRow;
    pledge_confirmations: PledgeConfirmationsRow;
    pledges: PledgesRow;
    rate_limits: RateLimitsRow;
    reject_tallies: RejectTalliesRow;
    sorts: SortsRow;
    stage_balances: StageBalancesRow;
    users: UsersRow;
  }
}
