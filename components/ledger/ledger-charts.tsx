import { formatter } from "@/lib/format";
import type { Look } from "@/lib/format/look";
import { dayTick, type DailyPoint } from "@/lib/ledger/daily-series";

export type { DailyPoint };

export interface YieldPoint {
  name: string;
  yieldPercent: number;
  counted: number;
}

// The ledger's two charts, drawn by the server in HTML and CSS (a bar is a box
// of a share of the height or width): no chart library reaches the phone, so
// the page has nothing to draw after it arrives and nothing moves. Each figure
// is one image to a screen reader, named by what it shows; a bar's title gives
// its exact figure.

const GOOD = "#2f6a4a";
const TOTAL = "#a8431a";

/** Axis steps of 1, 2 or 5 × 10ⁿ (whole cans, so at least 1), at most four intervals up to `top`. */
export function axisSteps(top: number): number[] {
  if (top <= 0) return [0];
  const rough = top / 4;
  const power = 10 ** Math.max(0, Math.floor(Math.log10(rough)));
  const step = [1, 2, 5, 10].map((m) => m * power).find((s) => s >= rough) ?? 10 * power;
  const out: number[] = [];
  for (let v = 0; v <= top + 1e-9; v += step) out.push(Math.round(v));
  return out;
}

export function GoodCansChart({ daily, target, look }: { daily: DailyPoint[]; target: number; look: Look }) {
  const f = formatter(look);
  if (daily.every((d) => d.goodCans === 0)) return <p className="text-ink-soft">No good cans counted yet for this drive.</p>;
  const top = Math.ceil(Math.max(target, daily[daily.length - 1]?.cumulative ?? 0, 1) * 1.05);
  const pct = (v: number) => `${Math.min(100, (v / top) * 100)}%`;
  const n = daily.length;
  // The running total as a line across the same columns as the bars (each point at its column's middle).
  const line = daily.map((d, i) => `${((i + 0.5) / n) * 100},${100 - (d.cumulative / top) * 100}`).join(" ");
  const labelEvery = Math.max(1, Math.ceil(n / 6));
  return (
    <figure>
      <div className="flex h-64 w-full gap-1" role="img" aria-label={`Good cans per day and in total, against a target of ${f.count(target, "can")}`}>
        <div className="relative mb-5 w-10 shrink-0 text-right text-xs text-ink-soft" aria-hidden="true">
          {axisSteps(top).map((v) => (
            <span key={v} className="absolute right-1 translate-y-1/2" style={{ bottom: pct(v) }}>
              {f.number(v)}
            </span>
          ))}
        </div>
        <div className="flex min-w-0 flex-1 flex-col">
          <div className="relative flex-1 border-b border-l border-ink/40">
            <div className="absolute inset-0 flex items-end">
              {daily.map((d) => (
                <div key={d.date} className="flex h-full flex-1 items-end justify-center" title={`${f.day(d.date)}: ${f.count(d.goodCans, "good can")}, ${f.number(d.cumulative)} in total`}>
                  <div className="w-3/5 max-w-[18px]" style={{ height: pct(d.goodCans), background: GOOD }} />
                </div>
              ))}
            </div>
            <svg className="absolute inset-0 h-full w-full overflow-visible" viewBox="0 0 100 100" preserveAspectRatio="none" aria-hidden="true">
              <polyline points={line} fill="none" stroke={TOTAL} strokeWidth={3} vectorEffect="non-scaling-stroke" />
            </svg>
            <div className="absolute inset-x-0 border-t-2 border-dashed border-ink" style={{ bottom: pct(target) }}>
              <span className="absolute left-1 top-0.5 text-xs">target {f.number(target)}</span>
            </div>
          </div>
          <div className="flex h-5 text-xs text-ink-soft" aria-hidden="true">
            {daily.map((d, i) => (
              <span key={d.date} className="flex-1 overflow-visible whitespace-nowrap text-center">
                {i % labelEvery === 0 ? dayTick(d.t, look) : ""}
              </span>
            ))}
          </div>
        </div>
      </div>
      <figcaption className="mt-1 text-sm text-ink-faint">Bars: good cans counted each day. Line: running total. Dashed: the drive&apos;s target.</figcaption>
    </figure>
  );
}

export function YieldChart({ points }: { points: YieldPoint[] }) {
  const sorted = points.filter((p) => p.counted > 0);
  if (sorted.length === 0) return <p className="text-ink-soft">No drop point has sorted cans yet.</p>;
  // Names down the side in whole words (they wrap, never cut), bars across.
  return (
    <figure>
      <div className="flex flex-col gap-3" role="img" aria-label="Yield per drop point: the share of counted cans that were good">
        {sorted.map((p) => (
          <div key={p.name} className="grid grid-cols-[8.5rem_1fr] items-center gap-2 text-sm" title={`${p.name}: ${p.yieldPercent} % of ${p.counted} counted`}>
            <span className="text-right leading-tight">{p.name}</span>
            <span className="flex items-center gap-2">
              <span className="h-7 rounded-r" style={{ width: `${Math.min(100, p.yieldPercent) * 0.8}%`, background: GOOD }} />
              <span className="tabular-nums">{p.yieldPercent} %</span>
            </span>
          </div>
        ))}
      </div>
      <figcaption className="mt-1 text-sm text-ink-faint">Yield = good ÷ (good + rejected), from sorted hauls only.</figcaption>
    </figure>
  );
}
