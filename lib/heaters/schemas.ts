/**
 * Inputs of `POST /api/plan/can-grid` and `POST /api/plan/heat-output`, and of
 * the planner forms: one schema each so the form shows exactly the messages
 * the handler would return. Safe to import in the client.
 */
import { z } from "zod";
import {
  CAN_GRID_DEFAULTS_MM,
  DEFAULT_HOLES_PER_CAN,
  fromMm,
  MM_PER_INCH,
  resolveCanGridInput,
  toMm,
  type CanGridInput,
  type LengthUnit,
  type ResolvedCanGridInput,
} from "./grid-input";

// The plain parts live in ./grid-input (no zod, for the planner's first screen); kept importable from here.
export { CAN_GRID_DEFAULTS_MM, DEFAULT_HOLES_PER_CAN, fromMm, MM_PER_INCH, resolveCanGridInput, toMm };
export type { CanGridInput, LengthUnit, ResolvedCanGridInput };

type LengthField = keyof typeof CAN_GRID_DEFAULTS_MM | "glazingWidth" | "glazingHeight";

/**
 * Plausible ranges in millimetres. They keep one request's arithmetic small
 * and catch slips such as millimetres typed into an inch form; a drink can is
 * roughly 50–70 mm across, so the can limits are generous on purpose.
 */
const LIMITS_MM: Record<LengthField, { label: string; min: number; max: number }> = {
  glazingWidth: { label: "Glazing width", min: 0, max: 10_000 },
  glazingHeight: { label: "Glazing height", min: 0, max: 10_000 },
  canDiameter: { label: "Can diameter", min: 20, max: 300 },
  canLength: { label: "Can length", min: 20, max: 500 },
  manifoldHeight: { label: "Manifold height", min: 0, max: 1_000 },
  edgeClearance: { label: "Edge clearance", min: 0, max: 1_000 },
  frameAllowanceWidth: { label: "Frame allowance (width)", min: 0, max: 2_000 },
  frameAllowanceHeight: { label: "Frame allowance (height)", min: 0, max: 2_000 },
};

function numberField(label: string) {
  return z.number({
    error: (issue) =>
      issue.input === undefined || issue.input === null ? `${label} is required` : `${label} must be a number`,
  });
}

function lengthField(field: LengthField, allowZero: boolean) {
  const { label } = LIMITS_MM[field];
  const base = numberField(label);
  return allowZero
    ? base.nonnegative({ error: `${label} cannot be negative` })
    : base.positive({ error: `${label} must be greater than 0` });
}

function formatLimit(mm: number, unit: LengthUnit): string {
  return unit === "mm" ? `${mm} mm` : `${Number(fromMm(mm, unit).toFixed(1))} in`;
}

const canGridObject = z.object(
  {
    glazingWidth: lengthField("glazingWidth", false),
    glazingHeight: lengthField("glazingHeight", false),
    unit: z.enum(["mm", "in"], { error: 'Unit must be "mm" or "in"' }),
    coverage: z.enum(["chamber", "full"], { error: 'Coverage must be "chamber" or "full"' }),
    manifoldHeight: lengthField("manifoldHeight", true).optional(),
    canDiameter: lengthField("canDiameter", false).optional(),
    canLength: lengthField("canLength", false).optional(),
    edgeClearance: lengthField("edgeClearance", true).optional(),
    holesPerCan: numberField("Holes per can")
      .int({ error: "Holes per can must be a whole number" })
      .min(1, { error: "Holes per can must be at least 1" })
      .max(64, { error: "Holes per can must be at most 64" })
      .optional(),
    // Totals added to the glazing's size (both sides together) to reach the
    // box's outer size: frame members, rebates, trim.
    frameAllowanceWidth: lengthField("frameAllowanceWidth", true).optional(),
    frameAllowanceHeight: lengthField("frameAllowanceHeight", true).optional(),
  },
  { error: "Send the glazing size, its unit and what it covers" },
);

// The hand-written CanGridInput is what this schema takes: a compile error here when they part.
type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
export const CAN_GRID_INPUT_TYPE_MATCHES: Same<z.input<typeof canGridObject>, CanGridInput> = true;

/** The plan as sent, its limits checked, with what was left out still missing (no default filled in). */
export const canGridGivenSchema = canGridObject.superRefine((input, ctx) => {
    // Limits depend on the unit, so they are checked once the unit is known.
    for (const field of Object.keys(LIMITS_MM) as LengthField[]) {
      const value = input[field];
      if (value === undefined) continue;
      const { label, min, max } = LIMITS_MM[field];
      const mm = toMm(value, input.unit);
      if (mm > max) {
        ctx.addIssue({ code: "custom", path: [field], message: `${label} must be at most ${formatLimit(max, input.unit)}` });
      } else if (min > 0 && mm < min) {
        ctx.addIssue({ code: "custom", path: [field], message: `${label} must be at least ${formatLimit(min, input.unit)}` });
      }
    }
});

export const canGridInputSchema = canGridGivenSchema.transform(resolveCanGridInput);

// A true minus sign reads better than a hyphen in "at least −60 °C".
const signed = (n: number) => (n < 0 ? `−${-n}` : `${n}`);

function bounded(label: string, min: number, max: number, suffix: string, exclusiveMin = false) {
  const base = numberField(label);
  const lower = exclusiveMin
    ? base.gt(min, { error: `${label} must be greater than ${signed(min)}${suffix}` })
    : base.min(min, { error: `${label} must be at least ${signed(min)}${suffix}` });
  return lower.max(max, { error: `${label} must be at most ${max}${suffix}` });
}

export const heatOutputInputSchema = z.object(
  {
    apertureAreaM2: bounded("Aperture area", 0, 100, " m²", true),
    // Above the solar constant (≈ 1361 W/m²) no unconcentrated sunlight exists.
    irradianceWm2: bounded("Irradiance", 0, 1400, " W/m²", true),
    eta0: bounded("Optical efficiency η0", 0, 1, ""),
    a1: bounded("Heat loss coefficient a1", 0, 100, " W/(m²·K)"),
    inletC: bounded("Inlet temperature", -60, 100, " °C"),
    ambientC: bounded("Outdoor temperature", -60, 100, " °C"),
    // The linear efficiency curve assumes a fan moves the air.
    airflowM3h: bounded("Airflow", 0, 10_000, " m³/h", true),
  },
  { error: "Send the aperture area, irradiance, collector coefficients, temperatures and airflow" },
);

export type HeatOutputInput = z.infer<typeof heatOutputInputSchema>;
