"use client";

import { useMemo, useState } from "react";
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { buttonClass } from "@/components/ui/button";
import { EmptyState, Skeleton } from "@/components/ui/card";
import { fetchJson } from "@/lib/api/client";
import { ledgerKeys } from "@/hooks/queries/ledger";
import { STAGES } from "@/lib/ledger/schemas";
import type { LogDrive } from "./log-home";
import { formatDateTime } from "@/lib/format";
import { sentLabel } from "@/lib/ledger/entry-time";

interface Row {
  id: string;
  kind: string;
  occurredAt: string;
  recordedAt: string;
  person: string;
  drive: string;
  dropPoint: string | null;
  heaterUnit: string | null;
  from: string | null;
  to: string | null;
  quantity: number;
  reason: string | null;
  isEstimate: boolean;
  reversesId: string | null;
}

const select = "min-h-11 rounded-lg border-2 border-ink/40 bg-white px-2";

export function LedgerTable({ drives, people, initialDriveId }: { drives: LogDrive[]; people: { id: string; name: string }[]; initialDriveId: string }) {
  const [f, setF] = useState<Record<string, string>>({ driveId: initialDriveId });
  const set = (k: string, v: string) => setF((old) => Object.fromEntries(Object.entries({ ...old, [k]: v }).filter(([, x]) => x !== "")));
  const qs = useMemo(() => new URLSearchParams(f).toString(), [f]);
  const rows = useQuery({ queryKey: ledgerKeys.list(f), queryFn: () => fetchJson<Row[]>(`/api/ledger?${qs}`), placeholderData: keepPreviousData });
  const dropPoints = drives.find((d) => d.id === f.driveId)?.dropPoints ?? drives.flatMap((d) => d.dropPoints);

  return (
    <div className="flex flex-col gap-3">
      <form className="grid grid-cols-2 gap-2 sm:grid-cols-3 lg:grid-cols-6" aria-label="Filter the ledger" onSubmit={(e) => e.preventDefault()}>
        <label className="flex flex-col text-sm font-semibold">
          Drive
          <select className={select} value={f.driveId ?? ""} onChange={(e) => set("driveId", e.target.value)}>
            <option value="">All drives</option>
            {drives.map((d) => <option key={d.id} value={d.id}>{d.name}</option>)}
          </select>
        </label>
        <label className="flex flex-col text-sm font-semibold">
          Drop point
          <select className={select} value={f.dropPointId ?? ""} onChange={(e) => set("dropPointId", e.target.value)}>
            <option value="">All</option>
            {dropPoints.map((p) => <option key={p.id} value={p.id}>{p.name}</option>)}
          </select>
        </label>
        <label className="flex flex-col text-sm font-semibold">
          Stage
          <select className={select} value={f.stage ?? ""} onChange={(e) => set("stage", e.target.value)}>
            <option value="">All</option>
            {STAGES.map((s) => <option key={s} value={s}>{s}</option>)}
          </select>
        </label>
        <label className="flex flex-col text-sm font-semibold">
          Person
          <select className={select} value={f.personId ?? ""} onChange={(e) => set("personId", e.target.value)}>
            <option value="">Everyone</option>
            {people.map((p) => <option key={p.id} value={p.id}>{p.name}</option>)}
          </select>
        </label>
        <label className="flex flex-col text-sm font-semibold">
          From
          <input type="date" className={select} value={f.from ?? ""} onChange={(e) => set("from", e.target.value)} />
        </label>
        <label className="flex flex-col text-sm font-semibold">
          To
          <input type="date" className={select} value={f.to ?? ""} onChange={(e) => set("to", e.target.value)} />
        </label>
      </form>
      <div>
        <a className={buttonClass("secondary")} href={`/api/ledger/export?${qs}`} download>
          Download CSV
        </a>
      </div>
      {rows.isPending ? (
        <Skeleton className="h-40 w-full" />
      ) : rows.isError ? (
        <p role="alert" className="text-alarm">Could not load the ledger: {rows.error.message}. Change a filter or reload to try again.</p>
      ) : rows.data.length === 0 ? (
        <EmptyState title="No ledger lines match">Widen the dates or clear a filter.</EmptyState>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full min-w-[720px] text-left text-sm">
            <caption className="sr-only">Ledger lines, newest first</caption>
            <thead className="border-b-2 border-ink/30">
              <tr>
                {["When", "Entry", "Drive", "Drop point / unit", "From → to", "Cans", "Reason", "By"].map((h) => (
                  <th key={h} scope="col" className={`px-2 py-2 ${h === "Drive" && f.driveId ? "hidden" : ""}`}>{h}</th>
                ))}
              </tr>
            </thead>
            <tbody className="divide-y divide-paper-edge">
              {rows.data.map((r) => (
                <tr key={r.id} className={r.reversesId ? "bg-paper-deep" : ""}>
                  <td className="px-2 py-1 whitespace-nowrap">
                    {formatDateTime(r.occurredAt)}
                    {/* An entry kept offline is shown at when it happened, and when it reached the server. */}
                    {sentLabel(r.occurredAt, r.recordedAt) ? <span className="text-ink-faint">, {sentLabel(r.occurredAt, r.recordedAt)}</span> : null}
                  </td>
                  <td className="px-2 py-1">{r.kind}{r.reversesId ? ` (undoes line ${r.reversesId})` : ""}</td>
                  <td className={`px-2 py-1 ${f.driveId ? "hidden" : ""}`}>{r.drive}</td>
                  <td className="px-2 py-1">{r.dropPoint ?? r.heaterUnit ?? "—"}</td>
                  <td className="px-2 py-1">{r.from ?? "·"} → {r.to ?? "·"}</td>
                  <td className="px-2 py-1 tabular-nums">{r.isEstimate ? "≈" : ""}{r.quantity}</td>
                  <td className="px-2 py-1">{r.reason ?? ""}</td>
                  <td className="px-2 py-1">{r.person}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
