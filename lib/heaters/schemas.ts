/**
 * Inputs of `POST /api/plan/can-grid` and `POST /api/plan/heat-output`, and of
 * the planner forms: one schema each so the form shows exactly the messages
 * the handler would return. Safe to import in the client.
 */
import { z } from "zod";
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

/** What a client may send (every optional length in the request's unit). */
export type CanGridInput = z.input<typeof canGridObject>;

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

export const canGridInputSchema = canGridObject
  .superRefine((input, ctx) => {
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
  })
  .transform(resolveCanGridInput);

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
