/**
 * Materials list of one heater unit, from its can grid. Pure. Geometry stays
 * in the request's unit (areas in unit²); each line also carries a trade
 * measure (m² and m for mm plans, ft² and ft for inch plans) so unit prices
 * read the way shops quote them.
 */
import { computeCanGrid, type CanGridResult } from "./can-grid";
import { fromMm, MM_PER_INCH, resolveCanGridInput, type CanGridInput, type LengthUnit } from "./grid-input";

/** US fluid ounce in millilitres, exact by definition (NIST Handbook 44). */
export const US_FL_OZ_ML = 29.5735295625;
/** A common caulking-gun cartridge: 10.1 US fl oz. */
export const DEFAULT_CARTRIDGE_ML = 10.1 * US_FL_OZ_ML;
/** A 3/8 in round bead, in millimetres. */
export const DEFAULT_BEAD_DIAMETER_MM = 9.525;
/**
 * Extra adhesive for starts, stops and squeeze-out: our own planning margin,
 * not a published figure; callers may set it to 0.
 */
export const DEFAULT_ADHESIVE_ALLOWANCE = 0.1;

export type MaterialKey =
  | "glazing"
  | "absorberPaint"
  | "adhesive"
  | "frameLumber"
  | "insulation"
  | "fan"
  | "thermostatSwitch"
  | "backdraftDamper";

export type TradeMeasure = "m2" | "ft2" | "m" | "ft" | "cartridge" | "each";

export interface MaterialLine {
  key: MaterialKey;
  quantity: number;
  measure: TradeMeasure;
  unitPrice?: number;
  cost?: number;
}

export interface MaterialsOptions {
  /** Round bead diameter in the plan's unit; default 3/8 in. */
  beadDiameter?: number;
  cartridgeVolumeMl?: number;
  adhesiveAllowance?: number;
  /** Count the joint of each column to the top and bottom manifold (default true). */
  manifoldJoints?: boolean;
  /** Inside depth of the box in the plan's unit; adds the side walls to the insulation. */
  boxDepth?: number;
  /** Price per trade measure of each line (per m² or ft², m or ft, cartridge, each). */
  prices?: Partial<Record<MaterialKey, number>>;
}

export interface MaterialsList {
  unit: LengthUnit;
  grid: CanGridResult;
  glazingArea: number;
  paintArea: number;
  adhesive: { joints: number; beadLength: number; beadLengthPerCartridge: number; cartridges: number };
  lumberLength: number;
  insulationArea: number;
  lines: MaterialLine[];
  /** Sum of the priced lines; null when no price was given. */
  cost: { total: number; complete: boolean } | null;
}

/** Bead length from a volume: L = V ÷ (π·d²/4). Volume in the length unit cubed. */
export function beadLengthPerCartridge(volume: number, beadDiameter: number): number {
  if (!(volume > 0) || !(beadDiameter > 0)) return 0;
  return volume / ((Math.PI * beadDiameter ** 2) / 4);
}

/** Millilitres (cm³) in the plan's unit cubed. */
function mlToUnitCubed(ml: number, unit: LengthUnit): number {
  return unit === "mm" ? ml * 1000 : (ml * 1000) / MM_PER_INCH ** 3;
}

export function computeMaterials(input: CanGridInput, options: MaterialsOptions = {}): MaterialsList {
  const p = resolveCanGridInput(input);
  const grid = computeCanGrid(input);
  const { unit } = p;
  const { columns, rows, cans } = grid;

  const glazingArea = p.glazingWidth * p.glazingHeight;
  // Black paint goes on the can walls and on the back panel seen through the
  // glazing; can ends are cut open or buried in joints, so they are left out.
  const paintArea = Math.PI * p.canDiameter * p.canLength * cans + glazingArea;

  // Assumption: every joint is one ring of adhesive round the can, π·d long —
  // rows − 1 can-to-can joints per column, plus one at each manifold.
  const jointsPerColumn = rows > 0 ? rows - 1 + (options.manifoldJoints === false ? 0 : 2) : 0;
  const joints = columns * jointsPerColumn;
  const beadLength = joints * Math.PI * p.canDiameter;
  const perCartridge = beadLengthPerCartridge(
    mlToUnitCubed(options.cartridgeVolumeMl ?? DEFAULT_CARTRIDGE_ML, unit),
    options.beadDiameter ?? fromMm(DEFAULT_BEAD_DIAMETER_MM, unit),
  );
  const needed = beadLength * (1 + (options.adhesiveAllowance ?? DEFAULT_ADHESIVE_ALLOWANCE));
  // The tolerance keeps an exact fill (7.000000001 cartridges) from buying an eighth.
  const cartridges = needed > 0 && perCartridge > 0 ? Math.ceil(needed / perCartridge - 1e-9) : 0;

  // One run of lumber round the outer frame; cut waste and battens are extra.
  const perimeter = 2 * (grid.outerSize.width + grid.outerSize.height);
  const lumberLength = perimeter;
  // Back panel over the outer size, plus the side walls when the depth is known.
  const insulationArea = grid.outerSize.width * grid.outerSize.height + perimeter * (options.boxDepth ?? 0);

  const area = (a: number) => (unit === "mm" ? a / 1e6 : a / 144);
  const length = (l: number) => (unit === "mm" ? l / 1000 : l / 12);
  const areaMeasure: TradeMeasure = unit === "mm" ? "m2" : "ft2";
  const lengthMeasure: TradeMeasure = unit === "mm" ? "m" : "ft";

  const bare: Array<Pick<MaterialLine, "key" | "quantity" | "measure">> = [
    { key: "glazing", quantity: area(glazingArea), measure: areaMeasure },
    { key: "absorberPaint", quantity: area(paintArea), measure: areaMeasure },
    { key: "adhesive", quantity: cartridges, measure: "cartridge" },
    { key: "frameLumber", quantity: length(lumberLength), measure: lengthMeasure },
    { key: "insulation", quantity: area(insulationArea), measure: areaMeasure },
    { key: "fan", quantity: 1, measure: "each" },
    { key: "thermostatSwitch", quantity: 1, measure: "each" },
    { key: "backdraftDamper", quantity: 1, measure: "each" },
  ];

  const prices = options.prices ?? {};
  const lines: MaterialLine[] = bare.map((line) => {
    const unitPrice = prices[line.key];
    if (unitPrice === undefined || !Number.isFinite(unitPrice) || unitPrice < 0) return { ...line };
    return { ...line, unitPrice, cost: line.quantity * unitPrice };
  });
  const priced = lines.filter((line) => line.cost !== undefined);
  const cost =
    priced.length === 0
      ? null
      : { total: priced.reduce((sum, line) => sum + (line.cost ?? 0), 0), complete: priced.length === lines.length };

  return {
    unit,
    grid,
    glazingArea,
    paintArea,
    adhesive: { joints, beadLength, beadLengthPerCartridge: perCartridge, cartridges },
    lumberLength,
    insulationArea,
    lines,
    cost,
  };
}
