"use client";

import { Bar, BarChart, CartesianGrid, ComposedChart, Line, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";

import { formatter } from "@/lib/format";
import type { Look } from "@/lib/format/look";
import { dayTick, type DailyPoint } from "@/lib/ledger/daily-series";
import { capitalise, stageLabel } from "@/lib/ledger/labels";

export interface YieldPoint {
  name: string;
  yieldPercent: number;
  counted: number;
}

// The charts' drawing, loaded on its own (recharts is most of the ledger
// page's JavaScript) once the page is up; ledger-charts.tsx holds the frame.

export default function GoodCansPlot({ daily, target, top, look }: { daily: DailyPoint[]; target: number; top: number; look: Look }) {
  const f = formatter(look);
  const tick = (t: number) => dayTick(t, look);
  return (
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
  );
}

/** A drop point's name on the axis in whole words, on up to three lines, never cut mid-name. */
function NameTick({ x, y, payload }: { x?: number; y?: number; payload?: { value: string } }) {
  const words = (payload?.value ?? "").split(/\s+/);
  const lines: string[] = [];
  for (const w of words) {
    const last = lines[lines.length - 1];
    if (last !== undefined && (last + " " + w).length <= 18) lines[lines.length - 1] = `${last} ${w}`;
    else lines.push(w);
  }
  const shown = lines.length > 3 ? [...lines.slice(0, 2), lines.slice(2).join(" ")] : lines;
  return (
    <text x={x} y={y} textAnchor="end" fontSize={12} fill="#3b342b">
      {shown.map((line, i) => (
        <tspan key={i} x={x} dy={i === 0 ? `${-(shown.length - 1) * 0.55 + 0.35}em` : "1.1em"}>
          {line}
        </tspan>
      ))}
    </text>
  );
}

export function YieldPlot({ points }: { points: YieldPoint[] }) {
  // Bars across, names down the side: long names keep every word.
  return (
    <ResponsiveContainer width="100%" height="100%">
      <BarChart data={points} layout="vertical" margin={{ top: 5, right: 16, bottom: 5, left: 0 }}>
        <CartesianGrid stroke="#e2d5bf" strokeDasharray="3 3" />
        <XAxis type="number" domain={[0, 100]} unit=" %" tick={{ fontSize: 12 }} />
        <YAxis type="category" dataKey="name" width={136} interval={0} tick={<NameTick />} />
        <Tooltip formatter={(v) => `${v} %`} />
        <Bar dataKey="yieldPercent" name="Yield" fill="#2f6a4a" maxBarSize={28} />
      </BarChart>
    </ResponsiveContainer>
  );
}
