import type { CanGridResult } from "@/lib/heaters/can-grid";
import { formatLength } from "@/lib/heaters/format";
import type { ResolvedCanGridInput } from "@/lib/heaters/grid-input";
import { SheetOutline } from "./sheet-outline";

// Past this many cans single cans are too small to see; columns are drawn instead.
const MAX_DRAWN_CANS = 1500;

/**
 * The glazing sheet seen from the front: can columns from the bottom-left
 * corner (inside the edge clearance), manifolds where they sit, and the slack
 * left over hatched so a builder sees what a sheet wastes.
 */
export function GridPreview({ plan, grid, title }: { plan: ResolvedCanGridInput; grid: CanGridResult; title: string }) {
  const { glazingWidth: W, glazingHeight: H, edgeClearance: e, canDiameter: d, canLength: L, manifoldHeight: m, unit } = plan;
  const full = plan.coverage === "full";
  // Chamber coverage: the manifolds sit outside the sheet, above and below it.
  const outside = full ? 0 : m;
  const totalH = H + 2 * outside;
  const pad = Math.max(W, totalH) * 0.04;
  const sheetY = pad + outside;
  const chamberBottom = sheetY + H - e - (full ? m : 0);
  const left = pad + e;
  const gridW = grid.columns * d;
  const gridH = grid.rows * L;
  const drawCans = grid.cans <= MAX_DRAWN_CANS;
  const cans: Array<{ x: number; y: number; h: number }> = [];
  for (let c = 0; c < grid.columns; c++) {
    if (!drawCans) {
      cans.push({ x: left + c * d, y: chamberBottom - gridH, h: gridH });
      continue;
    }
    for (let r = 0; r < grid.rows; r++) cans.push({ x: left + c * d, y: chamberBottom - (r + 1) * L, h: L });
  }
  const stroke = Math.max(W, totalH) / 400;
  const fontSize = Math.max(W, totalH) / 28;
  return (
    <figure className="flex flex-col gap-2">
      <svg
        role="img"
        aria-labelledby="grid-preview-title"
        viewBox={`0 0 ${W + 2 * pad} ${totalH + 2 * pad}`}
        className="mx-auto max-h-[28rem] w-full max-w-sm"
      >
        <title id="grid-preview-title">{title}</title>
        <defs>
          <pattern id="slack-hatch" patternUnits="userSpaceOnUse" width={fontSize} height={fontSize} patternTransform="rotate(45)">
            <line x1="0" y1="0" x2="0" y2={fontSize} stroke="#8a5a00" strokeWidth={stroke * 2} />
          </pattern>
        </defs>
        <SheetOutline x={pad} y={sheetY} width={W} height={H} manifold={m} full={full} stroke={stroke} dash={stroke * 4} />
        {grid.slack.width > 0 ? (
          <rect x={left + gridW} y={chamberBottom - (full ? H - 2 * m - 2 * e : H - 2 * e)} width={grid.slack.width} height={full ? H - 2 * m - 2 * e : H - 2 * e} fill="url(#slack-hatch)" opacity={0.7} />
        ) : null}
        {grid.slack.height > 0 ? (
          <rect x={left} y={chamberBottom - gridH - grid.slack.height} width={gridW} height={grid.slack.height} fill="url(#slack-hatch)" opacity={0.7} />
        ) : null}
        {cans.map((can, i) => (
          <rect key={i} x={can.x + stroke} y={can.y + stroke} width={d - 2 * stroke} height={can.h - 2 * stroke} rx={d / 5} fill="#1f1b16" opacity={0.85} />
        ))}
      </svg>
      <figcaption className="text-sm text-ink-faint">
        {grid.columns} columns × {grid.rows} rows seen from the front. Hatched: slack ({formatLength(grid.slack.width, unit)} across,{" "}
        {formatLength(grid.slack.height, unit)} up). {full ? "Manifolds inside the sheet" : "Dashed: manifolds outside the sheet"}, shaded.
      </figcaption>
    </figure>
  );
}
