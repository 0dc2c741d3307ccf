"use client";

import { SelectField } from "@/components/ui/field";
import { STAGES } from "@/lib/ledger/codes";
import { capitalise, stageLabel } from "@/lib/ledger/labels";
import type { LogDrive } from "@/lib/drives/types";
import type { LedgerFilterKey } from "./ledger-table-url";

const select = "min-h-11 rounded-lg border-2 border-ink/40 bg-white px-2";
// The filters sit in a tight grid: smaller labels than a form's.
const small = "text-sm [&>label]:text-sm";

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
      <SelectField id="ledger-drive" label="Drive" className={small} value={f.driveId ?? ""} onChange={(e) => set("driveId", e.target.value)} placeholder="All drives" options={drives.map((d) => ({ value: d.id, label: d.name }))} />
      <SelectField id="ledger-drop-point" label="Drop point" className={small} value={f.dropPointId ?? ""} onChange={(e) => set("dropPointId", e.target.value)} placeholder="All" options={dropPoints.map((p) => ({ value: p.id, label: p.name }))} />
      <SelectField id="ledger-stage" label="Stage" className={small} value={f.stage ?? ""} onChange={(e) => set("stage", e.target.value)} placeholder="All" options={STAGES.map((s) => ({ value: s, label: capitalise(stageLabel(s)) }))} />
      <SelectField id="ledger-person" label="Person" className={small} value={f.personId ?? ""} onChange={(e) => set("personId", e.target.value)} placeholder="Everyone" options={people.map((p) => ({ value: p.id, label: p.name }))} />
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
