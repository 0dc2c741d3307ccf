"use client";

import dynamic from "next/dynamic";
import { useNearViewport } from "@/hooks/use-near-viewport";
import type { DailyPoint } from "@/lib/ledger/daily-series";
import type { YieldPoint } from "./ledger-charts-plots";

import { useFormat } from "@/hooks/use-look";

export type { DailyPoint, YieldPoint };

// The frames are rendered by the server at their final size; the drawing
// (recharts) arrives on demand, once its box is near the screen, into a box of
// fixed height, so nothing moves when it does. A chart measures its box in the
// browser anyway, so the server could not draw it.
const placeholder = () => <div className="h-full w-full rounded bg-paper-deep/60" />;

function PlotBox({ label, height = 256, children }: { label: string; height?: number; children: React.ReactNode }) {
  const [ref, near] = useNearViewport<HTMLDivElement>("200px");
  return (
    <div ref={ref} className="w-full" style={{ height }} role="img" aria-label={label}>
      {near ? children : placeholder()}
    </div>
  );
}
const GoodCansPlot = dynamic(() => import("./ledger-charts-plots"), { ssr: false, loading: placeholder });
const YieldPlot = dynamic(() => import("./ledger-charts-plots").then((m) => m.YieldPlot), { ssr: false, loading: placeholder });

export function GoodCansChart({ daily, target }: { daily: DailyPoint[]; target: number }) {
  const f = useFormat();
  if (daily.every((d) => d.goodCans === 0)) return <p className="text-ink-soft">No good cans counted yet for this drive.</p>;
  const top = Math.max(target, daily[daily.length - 1]?.cumulative ?? 0);
  return (
    <figure>
      <PlotBox label={`Good cans per day and in total, against a target of ${f.count(target, "can")}`}>
        <GoodCansPlot daily={daily} target={target} top={top} look={f.look} />
      </PlotBox>
      <figcaption className="mt-1 text-sm text-ink-faint">Bars: good cans counted each day. Line: running total. Dashed: the drive&apos;s target.</figcaption>
    </figure>
  );
}


export function YieldChart({ points }: { points: YieldPoint[] }) {
  const sorted = points.filter((p) => p.counted > 0);
  if (sorted.length === 0) return <p className="text-ink-soft">No drop point has sorted cans yet.</p>;
  return (
    <figure>
      <PlotBox label="Yield per drop point: the share of counted cans that were good" height={Math.max(256, 40 + sorted.length * 56)}>
        <YieldPlot points={sorted} />
      </PlotBox>
      <figcaption className="mt-1 text-sm text-ink-faint">Yield = good ÷ (good + rejected), from sorted hauls only.</figcaption>
    </figure>
  );
}
