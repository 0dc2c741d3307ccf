/**
 * The planner's form state: what the person typed, as text, so nothing they
 * typed is lost on a bad value; and how it becomes the can-grid input.
 */
import { fieldErrorsOf, type FieldErrors } from "@/lib/api/errors";
import { computeCanGrid, type CanGridResult } from "@/lib/heaters/can-grid";
import { fromMm, MM_PER_INCH, type CanGridInput, type LengthUnit } from "@/lib/heaters/grid-input";
import type { canGridInputSchema } from "@/lib/heaters/schemas";

/** The schema the typed sizes are checked with; it arrives after the page is drawn (hooks/use-lazy-schemas). */
export type CanGridSchema = typeof canGridInputSchema;

/** One glazing sheet to compare, with what it covers and its own manifold height. */
export interface GlazingDraft {
  key: number;
  label: string;
  width: string;
  height: string;
  coverage: "chamber" | "full";
  manifoldHeight: string;
}

/** What every sheet shares: the unit, the cans, clearance, holes and frame. */
export interface PlanSettings {
  unit: LengthUnit;
  canDiameter: string;
  canLength: string;
  edgeClearance: string;
  holesPerCan: string;
  frameAllowanceWidth: string;
  frameAllowanceHeight: string;
}

export const SETTING_FIELDS = [
  "canDiameter",
  "canLength",
  "edgeClearance",
  "frameAllowanceWidth",
  "frameAllowanceHeight",
] as const;

export const INITIAL_SETTINGS: PlanSettings = {
  unit: "in",
  canDiameter: "",
  canLength: "",
  edgeClearance: "",
  holesPerCan: "",
  frameAllowanceWidth: "",
  frameAllowanceHeight: "",
};

export const INITIAL_OPTIONS: GlazingDraft[] = [
  { key: 1, label: "Sheet A", width: "30", height: "60", coverage: "chamber", manifoldHeight: "" },
  { key: 2, label: "Sheet B", width: "28", height: "74", coverage: "full", manifoldHeight: "5" },
];

/** Blank means "use the default"; anything else is read as a number (NaN lets the schema say so). */
function num(text: string): number | undefined {
  const t = text.trim().replace(",", ".");
  return t === "" ? undefined : Number(t);
}

type SheetFields = Pick<GlazingDraft, "width" | "height" | "coverage" | "manifoldHeight">;

export function toCanGridInput(settings: PlanSettings, option: SheetFields): CanGridInput {
  return {
    glazingWidth: num(option.width) as number,
    glazingHeight: num(option.height) as number,
    unit: settings.unit,
    coverage: option.coverage,
    manifoldHeight: num(option.manifoldHeight),
    canDiameter: num(settings.canDiameter),
    canLength: num(settings.canLength),
    edgeClearance: num(settings.edgeClearance),
    holesPerCan: num(settings.holesPerCan),
    frameAllowanceWidth: num(settings.frameAllowanceWidth),
    frameAllowanceHeight: num(settings.frameAllowanceHeight),
  };
}

export type Evaluated =
  | { ok: true; input: CanGridInput; grid: CanGridResult }
  | { ok: false; input: CanGridInput; errors: FieldErrors; pending?: true };

/**
 * The sheets the page opens with, as can-grid input. A unit test checks each
 * against the schema, so the first screen can show their grids before the
 * schema has loaded; anything typed waits for the schema.
 */
const OPENING_INPUTS = new Set(INITIAL_OPTIONS.map((o) => JSON.stringify(toCanGridInput(INITIAL_SETTINGS, o))));

export function evaluate(settings: PlanSettings, option: SheetFields, schema: CanGridSchema | null): Evaluated {
  const input = toCanGridInput(settings, option);
  if (!schema) {
    return OPENING_INPUTS.has(JSON.stringify(input)) ? { ok: true, input, grid: computeCanGrid(input) } : { ok: false, input, errors: {}, pending: true };
  }
  const parsed = schema.safeParse(input);
  if (!parsed.success) return { ok: false, input, errors: fieldErrorsOf(parsed.error) };
  return { ok: true, input, grid: computeCanGrid(input) };
}

/** Converts a typed length to the other unit, keeping blanks blank. */
export function convertText(text: string, from: LengthUnit, to: LengthUnit): string {
  const n = num(text);
  if (n === undefined || !Number.isFinite(n) || from === to) return text;
  const value = to === "in" ? n / MM_PER_INCH : n * MM_PER_INCH;
  return String(Number(value.toFixed(to === "in" ? 3 : 1)));
}

/** The default shown as a placeholder, in the chosen unit. */
export function defaultText(mm: number, unit: LengthUnit): string {
  return String(Number(fromMm(mm, unit).toFixed(unit === "in" ? 3 : 0)));
}
