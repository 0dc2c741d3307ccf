import type { CanGridResult } from "@/lib/heaters/can-grid";
import { formatAperture, formatLength, formatNumber } from "@/lib/heaters/format";

/** The counts of one can grid, in the plan's unit. Shared by the planner, unit page and build sheet. */
export function GridFigures({ grid }: { grid: CanGridResult }) {
  const { unit } = grid;
  const items: Array<[string, string, string]> = [
    ["columns", "Columns", formatNumber(grid.columns)],
    ["rows", "Rows", formatNumber(grid.rows)],
    ["cans", "Cans", formatNumber(grid.cans)],
    ["holes", "Holes to punch", formatNumber(grid.holes)],
    ["slack-width", "Slack across", formatLength(grid.slack.width, unit)],
    ["slack-height", "Slack up", formatLength(grid.slack.height, unit)],
    ["aperture", "Aperture area", formatAperture(grid.apertureArea, unit)],
    ["outer", "Outer box size", `${formatLength(grid.outerSize.width, unit)} × ${formatLength(grid.outerSize.height, unit)}`],
  ];
  return (
    <dl className="grid content-start grid-cols-2 gap-x-4 gap-y-2 sm:grid-cols-4 print:grid-cols-2">
      {items.map(([key, label, value]) => (
        <div key={key} className="flex flex-col">
          <dt className="text-sm text-ink-faint">{label}</dt>
          <dd className="text-lg font-bold" data-figure={key}>
            {value}
          </dd>
        </div>
      ))}
    </dl>
  );
}
