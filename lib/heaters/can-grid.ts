/**
 * The can grid behind one glazing sheet (PRODUCT.md computation 1). Pure: no
 * I/O, lengths in the request's unit, areas in that unit squared.
 */
import { resolveCanGridInput, toMm, type CanGridInput, type LengthUnit } from "./grid-input";
import { formatLength } from "./format";

export interface CanGridResult {
  columns: number;
  rows: number;
  cans: number;
  holes: number;
  /** Space left over across (width) and along (height) the can columns. */
  slack: { width: number; height: number };
  /** Absorber area actually covered by cans, in `unit`². */
  apertureArea: number;
  unit: LengthUnit;
  /** The box's outside size: glazing, manifolds outside the glazing, frame allowances. */
  outerSize: { width: number; height: number };
}

// A sheet sized to fit exactly 11 cans gives 10.999999999… after unit
// conversion; the tolerance lets exact fits count without admitting a can
// that is really a hair too big (1e-9 of a can is far below any saw cut).
const FIT_TOLERANCE = 1e-9;

/** How many whole items of `size` fit in `space`; never negative. */
function fits(space: number, size: number): number {
  if (!(space > 0) || !(size > 0)) return 0;
  return Math.max(0, Math.floor(space / size + FIT_TOLERANCE));
}

/** Leftover after `count` items; the tolerance can make it a hair negative, so clamp. */
function leftover(space: number, count: number, size: number): number {
  return Math.max(0, space - count * size);
}

export function computeCanGrid(input: CanGridInput): CanGridResult {
  const p = resolveCanGridInput(input);
  const usableWidth = p.glazingWidth - 2 * p.edgeClearance;
  // With `full` coverage the sheet also spans both manifolds, so they take
  // their height out of the sheet; with `chamber` they sit outside it.
  const manifolds = 2 * p.manifoldHeight;
  const chamberHeight =
    p.coverage === "full" ? p.glazingHeight - manifolds - 2 * p.edgeClearance : p.glazingHeight - 2 * p.edgeClearance;

  const columns = fits(usableWidth, p.canDiameter);
  const rows = fits(chamberHeight, p.canLength);
  const cans = columns * rows;

  return {
    // Each direction follows its own formula, so a sheet too short for one
    // row still reports how many columns its width would take.
    columns,
    rows,
    cans,
    holes: cans * p.holesPerCan,
    slack: {
      width: leftover(usableWidth, columns, p.canDiameter),
      height: leftover(chamberHeight, rows, p.canLength),
    },
    // Choice: the aperture is the absorber the cans really cover (their
    // projected silhouette, columns·d by rows·L), not the whole sheet — slack
    // and edge strips collect little heat, so the heat estimate should not
    // count them.
    apertureArea: columns * p.canDiameter * (rows * p.canLength),
    unit: p.unit,
    outerSize: {
      width: p.glazingWidth + p.frameAllowanceWidth,
      height: p.glazingHeight + (p.coverage === "chamber" ? manifolds : 0) + p.frameAllowanceHeight,
    },
  };
}

/**
 * The smallest sheet that holds one can column across and one row of cans up:
 * width d + 2e; height L + 2e, plus 2m when the sheet also covers the manifolds.
 */
export function minimumSheet(input: CanGridInput): { width: number; height: number } {
  const p = resolveCanGridInput(input);
  return {
    width: p.canDiameter + 2 * p.edgeClearance,
    height: p.canLength + 2 * p.edgeClearance + (p.coverage === "full" ? 2 * p.manifoldHeight : 0),
  };
}

/** Plain words for a sheet too small for a single column or row of cans (it would hold 0 cans); empty when cans fit. */
export function fitProblems(input: CanGridInput): string[] {
  const grid = computeCanGrid(input);
  const p = resolveCanGridInput(input);
  const min = minimumSheet(input);
  const len = (v: number) => formatLength(v, p.unit);
  const problems: string[] = [];
  if (grid.columns === 0) {
    problems.push(
      `Too narrow for one column of cans: a column needs ${len(min.width)} across (one ${len(p.canDiameter)} can` +
        (p.edgeClearance > 0 ? ` plus ${len(p.edgeClearance)} clearance each side` : "") +
        `), and this sheet is ${len(p.glazingWidth)}. Use a wider sheet or a smaller clearance.`,
    );
  }
  if (grid.rows === 0) {
    const parts = [`one ${len(p.canLength)} can`];
    if (p.coverage === "full" && p.manifoldHeight > 0) parts.push(`two ${len(p.manifoldHeight)} manifolds`);
    if (p.edgeClearance > 0) parts.push(`${len(p.edgeClearance)} clearance top and bottom`);
    problems.push(
      `Too short for one row of cans: a row needs ${len(min.height)} up (${parts.join(", ")}), and this sheet is ${len(p.glazingHeight)}. ` +
        (p.coverage === "full" ? "Use a taller sheet, lower manifolds, or put the manifolds outside the sheet." : "Use a taller sheet or a smaller clearance."),
    );
  }
  return problems;
}

export interface GlazingOption {
  label: string;
  input: CanGridInput;
}

export interface GlazingComparison {
  label: string;
  grid: CanGridResult;
  /** Glazing sheet area in m², so options in different units compare. */
  glazingAreaM2: number;
  /** Cans per m² of glazing: more means less glass bought per can. */
  cansPerM2: number;
  /** Share of the sheet covered by cans, 0–1: more means less cut-off and slack. */
  coverage: number;
  /** 1 = best. Ties keep their given order. */
  rank: number;
}

/**
 * Compares glazing options side by side. Ranked by cans per m² of glazing,
 * then by the covered share of the sheet, then by the number of cans; the
 * input order is kept otherwise.
 */
export function compareGlazingOptions(options: readonly GlazingOption[]): GlazingComparison[] {
  const rows = options.map(({ label, input }, index) => {
    const grid = computeCanGrid(input);
    const sheet = input.glazingWidth * input.glazingHeight;
    const glazingAreaM2 = (toMm(input.glazingWidth, input.unit) * toMm(input.glazingHeight, input.unit)) / 1e6;
    return {
      index,
      label,
      grid,
      glazingAreaM2,
      cansPerM2: glazingAreaM2 > 0 ? grid.cans / glazingAreaM2 : 0,
      coverage: sheet > 0 ? grid.apertureArea / sheet : 0,
    };
  });
  // Ratios computed in different units can differ in the last bits.
  const better = (a: number, b: number) => (Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a), Math.abs(b)) ? 0 : b - a);
  const order = [...rows].sort(
    (a, b) =>
      better(a.cansPerM2, b.cansPerM2) || better(a.coverage, b.coverage) || b.grid.cans - a.grid.cans || a.index - b.index,
  );
  const rankOf = new Map(order.map((row, i) => [row.index, i + 1]));
  return rows.map(({ index, ...row }) => ({ ...row, rank: rankOf.get(index) ?? rows.length }));
}
