"use client";

import { Bar, BarChart, CartesianGrid, ComposedChart, Line, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";

import { dayTick, type DailyPoint } from "@/lib/ledger/daily-series";
import { useFormat } from "@/hooks/use-look";
import { capitalise, stageLabel } from "@/lib/ledger/labels";

export type { DailyPoint };

export function GoodCansChart({ daily, target }: { daily: DailyPoint[]; target: number }) {
  const f = useFormat();
  if (daily.every((d) => d.goodCans === 0)) return <p className="text-ink-soft">No good cans counted yet for this drive.</p>;
  const top = Math.max(target, daily[daily.length - 1]?.cumulative ?? 0);
  const tick = (t: number) => dayTick(t, f.look);
  return (
    <figure>
      <div className="h-64 w-full" role="img" aria-label={`Good cans per day and in total, against a target of ${f.count(target, "can")}`}>
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart data={daily} margin={{ top: 10, right: 10, bottom: 0, left: 0 }}>
            <CartesianGrid stroke="#e2d5bf" strokeDasharray="3 3" />
            {/* A numeric time axis: each day at its real place, so days without entries show as gaps. */}
            <XAxis dataKey="t" type="number" scale="time" domain={["dataMin - 43200000", "dataMax + 43200000"]} tick={{ fontSize: 12 }} tickFormatter={tick} />
            <YAxis tick={{ fontSize: 12 }} domain={[0, Math.ceil(top * 1.05)]} width={48} />
            <Tooltip labelFormatter={(t) => f.day(new Date(Number(t)).toISOString().slice(0, 10))} />
            <Bar dataKey="goodCans" name={`${capitalise(stageLabel("good"))} cans that day`} fill="#2f6a4a" maxBarSize={18} />
            <Line dataKey="cumulative" name={`${capitalise(stageLabel("good"))} cans in total`} stroke="#a8431a" strokeWidth={3} dot={false} type="linear" />
            <ReferenceLine y={target} stroke="#1f1b16" strokeDasharray="6 4" label={{ value: `target ${f.number(target)}`, position: "insideTopLeft", fontSize: 12 }} />
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="mt-1 text-sm text-ink-faint">Bars: good cans counted each day. Line: running total. Dashed: the drive&apos;s target.</figcaption>
    </figure>
  );
}

export interface YieldPoint {
  name: string;
  yieldPercent: number;
  counted: number;
}

export function YieldChart({ points }: { points: YieldPoint[] }) {
  const sorted = points.filter((p) => p.counted > 0);
  if (sorted.length === 0) return <p className="text-ink-soft">No drop point has sorted cans yet.</p>;
  return (
    <figure>
      <div className="h-64 w-full" role="img" aria-label="Yield per drop point: the share of counted cans that were good">
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={sorted} margin={{ top: 5, right: 10, bottom: 5, left: 0 }}>
            <CartesianGrid stroke="#e2d5bf" strokeDasharray="3 3" />
            <XAxis dataKey="name" tick={{ fontSize: 11 }} interval={0} height={48} tickFormatter={(n: string) => (n.length > 16 ? `${n.slice(0, 15)}…` : n)} />
            <YAxis domain={[0, 100]} unit=" %" tick={{ fontSize: 12 }} width={52} />
            <Tooltip formatter={(v) => `${v} %`} />
            <Bar dataKey="yieldPercent" name="Yield" fill="#2f6a4a" />
          </BarChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="mt-1 text-sm text-ink-faint">Yield = good ÷ (good + rejected), from sorted hauls only.</figcaption>
    </figure>
  );
}
