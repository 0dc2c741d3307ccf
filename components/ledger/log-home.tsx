"use client";

import { useState } from "react";
import { DriveBanner } from "@/components/drives/drive-banner";
import { useFormat } from "@/hooks/use-look";
import { SelectField } from "@/components/ui/field";
import { useRememberDrive } from "@/hooks/queries/current-drive";
import { HaulForm } from "./haul-form";
import { SortForm } from "./sort-form";
import { ProcessingForm } from "./processing-form";
import { StockCard } from "./stock-card";
import { OutboxList } from "./outbox-list";
import { RecentEntries } from "./recent-entries";
import { useOutbox } from "./use-outbox";
import type { LogDrive } from "@/lib/drives/types";

const TABS = [
  { id: "haul", label: "Log a haul" },
  { id: "sort", label: "Log a sort" },
  { id: "process", label: "Log processing" },
] as const;

export function LogHome({ drives, initialDriveId, initialDropPointId, today }: { drives: LogDrive[]; initialDriveId: string; initialDropPointId?: string; today: string }) {
  const [driveId, setDriveId] = useState(initialDriveId);
  const remembered = useRememberDrive();
  const { look } = useFormat();
  const [tab, setTab] = useState<(typeof TABS)[number]["id"]>("haul");
  const outbox = useOutbox();
  const drive = drives.find((d) => d.id === driveId) ?? drives[0];

  return (
    <div className="flex flex-col gap-5">
      {drives.length > 1 ? (
        <SelectField
          id="log-drive"
          label="Drive"
          value={drive.id}
          onChange={(e) => {
            setDriveId(e.target.value);
            remembered.remember(e.target.value);
          }}
          options={drives.map((d) => ({ value: d.id, label: d.name }))}
        />
      ) : null}
      <DriveBanner drive={drive} today={today} rememberError={remembered.error} look={look} />
      <OutboxList items={outbox.items} refusals={outbox.refusals} onRetry={() => void outbox.retryNow()} onDismiss={outbox.dismissRefusal} onConfirm={outbox.confirmRefusal} onFix={outbox.fixRefusal} />
      <div role="tablist" aria-label="What to log" className="grid grid-cols-3 gap-2">
        {TABS.map((t) => (
          <button
            key={t.id}
            role="tab"
            type="button"
            id={`tab-${t.id}`}
            aria-selected={tab === t.id}
            aria-controls={`panel-${t.id}`}
            onClick={() => setTab(t.id)}
            className={`min-h-12 rounded-lg border-2 px-2 py-1 font-semibold leading-tight focus-visible:outline-3 focus-visible:outline-ember ${tab === t.id ? "border-ember bg-ember text-white" : "border-ink/30 bg-white"}`}
          >
            {t.label}
          </button>
        ))}
      </div>
      <section role="tabpanel" id={`panel-${tab}`} aria-labelledby={`tab-${tab}`} className="rounded-card border border-paper-edge bg-white/70 p-4">
        {tab === "haul" ? <HaulForm key={drive.id} driveId={drive.id} dropPoints={drive.dropPoints} initialDropPointId={initialDropPointId} submit={outbox.submit} /> : null}
        {tab === "sort" ? <SortForm key={drive.id} driveId={drive.id} submit={outbox.submit} /> : null}
        {tab === "process" ? <ProcessingForm key={drive.id} driveId={drive.id} submit={outbox.submit} /> : null}
      </section>
      <StockCard driveId={drive.id} />
      <RecentEntries />
    </div>
  );
}
