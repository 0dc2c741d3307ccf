"use client";

import { SelectField } from "@/components/ui/field";
import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { Notice } from "@/components/ui/notice";
import { formatNumber } from "@/lib/heaters/format";
import { needRefusalMessage } from "@/lib/heaters/need";
import { heaterQueries, moveClaimsTo, postClaimAction } from "@/hooks/queries/heaters";
import { ledgerQueries } from "@/hooks/queries/ledger";
import type { HeaterSummary } from "@/lib/heaters/types";
import { QuantityAction } from "./quantity-action";
import { UnitFigures } from "./unit-figures";
import { countOf } from "@/lib/plural";

export interface ClaimsView {
  unit: HeaterSummary;
  driveId: string;
  rows: number;
  installed: boolean;
  isOrganiser: boolean;
  /** Why this person may not change the unit's cans (a builder on someone else's unit), or null. */
  refusal: string | null;
  otherUnits: Array<{ id: string; name: string }>;
}

/** Cans claimed for the unit and built into it, live, with the ledger actions that change them. */
export function ClaimsPanel({ v }: { v: ClaimsView }) {
  // Live figures: both reads start from what the page prefetched (<Prefetched>) and refresh after every action.
  const unit = useQuery({ ...heaterQueries.list(), select: (list) => list.find((u) => u.id === v.unit.id) }).data ?? v.unit;
  const stock = useQuery(ledgerQueries.stock(v.driveId)).data;
  const [moveTo, setMoveTo] = useState(v.otherUnits[0]?.id ?? "");
  if (!stock) return null; // only before the page's prefetched stock reaches the cache
  return (
    <div className="flex flex-col gap-4">
      <UnitFigures c={unit} />
      <p className="text-sm text-ink-soft" data-testid="drive-unclaimed">
        The drive has {formatNumber(stock.unclaimed)} finished or in-process cans no unit has claimed, {formatNumber(stock.stages.punched)} of them punched.
        Building in uses punched cans.
      </p>
      {v.installed ? (
        <Notice title="This heater is on the wall">It takes no more cans.</Notice>
      ) : v.refusal ? (
        <Notice title="Someone else builds this unit">{v.refusal}</Notice>
      ) : (
        <div className="grid gap-4 md:grid-cols-3">
          <QuantityAction
            id="claim-quantity"
            label="Claim cans"
            hint={`Sets cans aside for this unit; it still needs ${formatNumber(unit.remaining)}`}
            initial={Math.max(1, Math.min(unit.remaining, stock.unclaimed))}
            submitLabel="Claim"
            check={(q) => (q > unit.remaining ? needRefusalMessage(unit) : null)}
            run={(q, key) => postClaimAction(v.unit.id, "claims", q, key)}
          />
          <QuantityAction
            id="built-quantity"
            label="Record cans built in"
            hint={`One column is ${countOf(v.rows, "can")}`}
            initial={Math.max(1, Math.min(v.rows, unit.claimed))}
            submitLabel="Record built in"
            run={(q, key) => postClaimAction(v.unit.id, "built-in", q, key)}
          />
          <QuantityAction
            id="release-quantity"
            label="Release claimed cans"
            hint="Gives them back to the drive"
            initial={Math.max(1, unit.claimed)}
            submitLabel="Release"
            variant="secondary"
            run={(q, key) => postClaimAction(v.unit.id, "releases", q, key)}
          />
        </div>
      )}
      {v.isOrganiser && v.otherUnits.length > 0 ? (
        <div className="border-t border-paper-edge pt-3">
          <QuantityAction
            id="move-quantity"
            label="Cans to move"
            initial={Math.max(1, unit.claimed)}
            submitLabel="Move claim"
            variant="secondary"
            run={(q, key) => moveClaimsTo(v.unit.id, moveTo, q, key)}
          >
            <SelectField id="move-to" label="Move claimed cans to" value={moveTo} onChange={(e) => setMoveTo(e.target.value)} options={v.otherUnits.map((u) => ({ value: u.id, label: u.name }))} />
          </QuantityAction>
        </div>
      ) : null}
    </div>
  );
}
