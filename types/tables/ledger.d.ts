// Knex row types (how they are made: types/tables/accounts.d.ts): The ledger and the running totals it keeps.
import "knex/types/tables";

declare module "knex/types/tables" {
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
  interface RejectTalliesRow {
    group_id: string;
    drive_id: string;
    drop_point_id: string | null;
    reason: string;
    quantity: number;
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
  interface DriveDailyGoodRow {
    drive_id: string;
    day: string;
    good_cans: number;
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
  interface Tables {
    movements: MovementsRow;
    ledger_lines: LedgerLinesRow;
    hauls: HaulsRow;
    sorts: SortsRow;
    stage_balances: StageBalancesRow;
    reject_tallies: RejectTalliesRow;
    drop_point_tallies: DropPointTalliesRow;
    drive_daily_good: DriveDailyGoodRow;
    group_calibration: GroupCalibrationRow;
  }
}
