import type { CanGridResult } from "@/lib/heaters/can-grid";
import { formatLength } from "@/lib/heaters/format";
import type { ResolvedCanGridInput } from "@/lib/heaters/grid-input";
import { SheetOutline } from "./sheet-outline";

/**
 * The build sheet's drawing, to scale and dimensioned: the glazing sheet, the
 * manifolds, the can columns × rows inside the edge clearance, and the
 * lengths a builder cuts and checks (sheet, grid, one can, manifold).
 */
export function GridDimensions({ plan, grid }: { plan: ResolvedCanGridInput; grid: CanGridResult }) {
  const { glazingWidth: W, glazingHeight: H, edgeClearance: e, canDiameter: d, canLength: L, manifoldHeight: m, unit } = plan;
  const full = plan.coverage === "full";
  const outside = full ? 0 : m;
  const boxH = H + 2 * outside;
  const size = Math.max(W, boxH);
  const font = size / 30;
  const gap = font * 2.6; // room for each dimension line and its label
  const x0 = gap * 2;
  const y0 = gap * 1.5;
  const sheetY = y0 + outside;
  const bottom = sheetY + H - e - (full ? m : 0);
  const gridW = grid.columns * d;
  const gridH = grid.rows * L;
  const left = x0 + e;
  const stroke = size / 500;
  const len = (v: number) => formatLength(v, unit);
  const dim = (x1: number, y1: number, x2: number, y2: number, text: string, side: -1 | 1) => {
    const vertical = x1 === x2;
    const [tx, ty] = vertical ? [x1 + side * font * 0.6, (y1 + y2) / 2] : [(x1 + x2) / 2, y1 + side * font * 0.5 + (side > 0 ? font * 0.8 : 0)];
    return (
      <g key={text + x1 + y1}>
        <line x1={x1} y1={y1} x2={x2} y2={y2} stroke="#1f1b16" strokeWidth={stroke} markerStart="url(#dim-end)" markerEnd="url(#dim-end)" />
        <text
          x={tx}
          y={ty}
          fontSize={font}
          textAnchor={vertical ? "middle" : "middle"}
          transform={vertical ? `rotate(-90 ${tx} ${ty})` : undefined}
          dominantBaseline={vertical ? (side < 0 ? "auto" : "hanging") : undefined}
        >
          {text}
        </text>
      </g>
    );
  };
  const rowLines = grid.rows <= 60 ? Array.from({ length: grid.rows - 1 }, (_, r) => bottom - (r + 1) * L) : [];
  return (
    <figure className="flex flex-col gap-1">
      <svg role="img" aria-label={`Dimensioned grid: ${grid.columns} columns by ${grid.rows} rows`} viewBox={`0 0 ${W + x0 + gap * 2} ${boxH + y0 + gap * 1.5}`} className="mx-auto max-h-[30rem] w-full print:max-h-[105mm]">
        <defs>
          <marker id="dim-end" viewBox="0 0 10 10" refX="5" refY="5" markerWidth="6" markerHeight="6" orient="auto-start-reverse">
            <path d="M0,0 L10,5 L0,10 z" fill="#1f1b16" />
          </marker>
        </defs>
        <SheetOutline x={x0} y={sheetY} width={W} height={H} manifold={m} full={full} stroke={stroke} dash={stroke * 6} />
        {Array.from({ length: grid.columns }, (_, c) => (
          <rect key={c} x={left + c * d + stroke} y={bottom - gridH} width={d - 2 * stroke} height={gridH} rx={d / 6} fill="#3b342c" />
        ))}
        {rowLines.map((y) => (
          <line key={y} x1={left} x2={left + gridW} y1={y} y2={y} stroke="#f3ebdd" strokeWidth={stroke * 1.5} />
        ))}
        {dim(x0, y0 - gap * 0.6, x0 + W, y0 - gap * 0.6, `glazing ${len(W)}`, -1)}
        {dim(left, sheetY + H + outside + gap * 0.5, left + gridW, sheetY + H + outside + gap * 0.5, `${grid.columns} × ${len(d)} = ${len(gridW)}`, 1)}
        {dim(x0 - gap * 1.4, sheetY, x0 - gap * 1.4, sheetY + H, `glazing ${len(H)}`, -1)}
        {dim(x0 + W + gap * 0.5, bottom - gridH, x0 + W + gap * 0.5, bottom, `${grid.rows} × ${len(L)} = ${len(gridH)}`, 1)}
        {m > 0 ? dim(x0 - gap * 0.5, full ? sheetY : y0, x0 - gap * 0.5, (full ? sheetY : y0) + m, `manifold ${len(m)}`, -1) : null}
      </svg>
      <figcaption className="text-sm">
        {grid.columns} columns × {grid.rows} rows = {grid.cans} cans, drawn to scale from the front. One can: {len(d)} across, {len(L)} as stacked.
        Edge clearance {len(e)} each side; manifolds {len(m)} each, {full ? "inside the sheet (shaded)" : "outside the sheet (dashed)"}. Outer box{" "}
        {len(grid.outerSize.width)} × {len(grid.outerSize.height)}.
      </figcaption>
    </figure>
  );
}
