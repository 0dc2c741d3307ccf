"use client";

import { Bar, BarChart, CartesianGrid, ComposedChart, Line, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";

import { dayTick, type DailyPoint } from "@/lib/ledger/daily-series";
import { capitalise, stageLabel } from "@/lib/ledger/labels";

export interface YieldPoint {
  name: string;
  yieldPercent: number;
  counted: number;
}

// The charts' drawing, loaded on its own (recharts is most of the ledger
// page's JavaScript) once the page is up; ledger-charts.tsx holds the frame.

export default function GoodCansPlot({ daily, target, top }: { daily: DailyPoint[]; target: number; top: number }) {
  return (
    <ResponsiveContainer width="100%" height="100%">
      <ComposedChart data={daily} margin={{ top: 10, right: 10, bottom: 0, left: 0 }}>
        <CartesianGrid stroke="#e2d5bf" strokeDasharray="3 3" />
        {/* A numeric time axis: each day at its real place, so days without entries show as gaps. */}
        <XAxis dataKey="t" type="number" scale="time" domain={["dataMin - 43200000", "dataMax + 43200000"]} tick={{ fontSize: 12 }} tickFormatter={dayTick} />
        <YAxis tick={{ fontSize: 12 }} domain={[0, Math.ceil(top * 1.05)]} width={48} />
        <Tooltip labelFormatter={(t) => dayTick(Number(t))} />
        <Bar dataKey="goodCans" name={`${capitalise(stageLabel("good"))} cans that day`} fill="#2f6a4a" maxBarSize={18} />
        <Line dataKey="cumulative" name={`${capitalise(stageLabel("good"))} cans in total`} stroke="#a8431a" strokeWidth={3} dot={false} type="linear" />
        <ReferenceLine y={target} stroke="#1f1b16" strokeDasharray="6 4" label={{ value: `target ${target}`, position: "insideTopLeft", fontSize: 12 }} />
      </ComposedChart>
    </ResponsiveContainer>
  );
}

export function YieldPlot({ points }: { points: YieldPoint[] }) {
  return (
    <ResponsiveContainer width="100%" height="100%">
      <BarChart data={points} margin={{ top: 5, right: 10, bottom: 5, left: 0 }}>
        <CartesianGrid stroke="#e2d5bf" strokeDasharray="3 3" />
        <XAxis dataKey="name" tick={{ fontSize: 11 }} interval={0} height={48} tickFormatter={(n: string) => (n.length > 16 ? `${n.slice(0, 15)}…` : n)} />
        <YAxis domain={[0, 100]} unit=" %" tick={{ fontSize: 12 }} width={52} />
        <Tooltip formatter={(v) => `${v} %`} />
        <Bar dataKey="yieldPercent" name="Yield" fill="#2f6a4a" />
      </BarChart>
    </ResponsiveContainer>
  );
}
