"use client";

import { STAGES } from "@/lib/ledger/schemas";
import { capitalise, stageLabel } from "@/lib/ledger/labels";
import type { LogDrive } from "./log-home";
import type { LedgerFilterKey } from "./ledger-table-url";

const select = "min-h-11 rounded-lg border-2 border-ink/40 bg-white px-2";

interface Props {
  drives: LogDrive[];
  people: { id: string; name: string }[];
  filters: Partial<Record<LedgerFilterKey, string>>;
  set: (key: LedgerFilterKey, value: string) => void;
}

export function LedgerFilters({ drives, people, filters: f, set }: Props) {
  const dropPoints = drives.find((d) => d.id === f.driveId)?.dropPoints ?? drives.flatMap((d) => d.dropPoints);
  return (
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
          {STAGES.map((s) => <option key={s} value={s}>{capitalise(stageLabel(s))}</option>)}
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
  );
}
