/**
 * The can-grid input's plain parts: units, defaults and how the defaults are
 * filled in. No zod here, so the planner can draw its first screen without
 * it; the schema that checks this input is in ./schemas (loaded on demand in
 * the browser), and its inferred type is checked against CanGridInput there.
 */
import { MM_PER_INCH } from "@/lib/format/measures";

/** Exact by definition of the international inch (NIST SP 811); one constant, in lib/format. */
export { MM_PER_INCH };

export type LengthUnit = "mm" | "in";

/** A length given in millimetres, expressed in `unit`. */
export function fromMm(mm: number, unit: LengthUnit): number {
  return unit === "mm" ? mm : mm / MM_PER_INCH;
}

/** A length given in `unit`, expressed in millimetres. */
export function toMm(value: number, unit: LengthUnit): number {
  return unit === "mm" ? value : value * MM_PER_INCH;
}

/** Defaults in millimetres; converted to the request's unit when it is inches. */
export const CAN_GRID_DEFAULTS_MM = {
  canDiameter: 66,
  canLength: 122,
  manifoldHeight: 127,
  edgeClearance: 0,
  frameAllowanceWidth: 0,
  frameAllowanceHeight: 0,
} as const;
export const DEFAULT_HOLES_PER_CAN = 4;

/** What a client may send (every optional length in the request's unit). */
export interface CanGridInput {
  glazingWidth: number;
  glazingHeight: number;
  unit: LengthUnit;
  coverage: "chamber" | "full";
  manifoldHeight?: number | undefined;
  canDiameter?: number | undefined;
  canLength?: number | undefined;
  edgeClearance?: number | undefined;
  holesPerCan?: number | undefined;
  frameAllowanceWidth?: number | undefined;
  frameAllowanceHeight?: number | undefined;
}

/** The input with every default filled in, in the request's unit. */
export type ResolvedCanGridInput = Required<CanGridInput>;

/** Fills the defaults in the request's unit, so inches get 66 / 25.4 etc. exactly. */
export function resolveCanGridInput(input: CanGridInput): ResolvedCanGridInput {
  const d = (field: keyof typeof CAN_GRID_DEFAULTS_MM) => input[field] ?? fromMm(CAN_GRID_DEFAULTS_MM[field], input.unit);
  return {
    glazingWidth: input.glazingWidth,
    glazingHeight: input.glazingHeight,
    unit: input.unit,
    coverage: input.coverage,
    manifoldHeight: d("manifoldHeight"),
    canDiameter: d("canDiameter"),
    canLength: d("canLength"),
    edgeClearance: d("edgeClearance"),
    holesPerCan: input.holesPerCan ?? DEFAULT_HOLES_PER_CAN,
    frameAllowanceWidth: d("frameAllowanceWidth"),
    frameAllowanceHeight: d("frameAllowanceHeight"),
  };
}
