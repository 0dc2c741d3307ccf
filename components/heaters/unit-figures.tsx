import { formatNumber } from "@/lib/heaters/format";

export interface UnitCounts {
  cans: number;
  spare: number;
  need: number;
  claimed: number;
  builtIn: number;
  remaining: number;
}

/**
 * A unit's can figures: what it needs (its cans plus its spare share), what is
 * claimed and built in, and what it still needs. The unit page shows them live;
 * the build sheet prints the same component with the figures of the moment.
 */
export function UnitFigures({ c, printedAt }: { c: UnitCounts; printedAt?: string }) {
  const items: Array<[string, string, string]> = [
    ["need", `Cans it needs (${formatNumber(c.cans)} + ${formatNumber(c.spare)} spare)`, formatNumber(c.need)],
    ["claimed", "Claimed, not yet built in", formatNumber(c.claimed)],
    ["built-in", "Built in", `${formatNumber(c.builtIn)} of ${formatNumber(c.cans)}`],
    ["still-needed", "Still needed", formatNumber(c.remaining)],
  ];
  return (
    <div className="flex flex-col gap-1">
      <dl className="grid grid-cols-2 gap-x-4 gap-y-2 sm:grid-cols-4 print:grid-cols-2">
        {items.map(([id, label, value]) => (
          <div key={id} className="flex flex-col">
            <dt className="text-sm text-ink-faint">{label}</dt>
            <dd className="text-lg font-bold" data-figure={id}>
              {value}
            </dd>
          </div>
        ))}
      </dl>
      {printedAt ? <p className="text-sm text-ink-faint">Figures as of {printedAt}.</p> : null}
    </div>
  );
}
