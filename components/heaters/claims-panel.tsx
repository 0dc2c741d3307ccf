"use client";

import { useState } from "react";
import { Notice } from "@/components/ui/notice";
import { formatNumber } from "@/lib/heaters/format";
import { moveClaimsTo, postClaimAction } from "@/hooks/queries/heaters";
import { QuantityAction } from "./quantity-action";

export interface ClaimsView {
  unitId: string;
  cans: number;
  rows: number;
  claimed: number;
  builtIn: number;
  /** The drive's processed cans not claimed by any unit. */
  driveUnclaimed: number;
  drivePunched: number;
  installed: boolean;
  isOrganiser: boolean;
  otherUnits: Array<{ id: string; name: string }>;
}

/** Cans claimed for the unit and built into it, with the ledger actions that change them. */
export function ClaimsPanel({ v }: { v: ClaimsView }) {
  const toClaim = Math.max(0, v.cans - v.claimed - v.builtIn);
  const [moveTo, setMoveTo] = useState(v.otherUnits[0]?.id ?? "");
  return (
    <div className="flex flex-col gap-4">
      <dl className="grid grid-cols-2 gap-x-4 gap-y-2 sm:grid-cols-4">
        <Figure id="needed" label="Cans needed" value={formatNumber(v.cans)} />
        <Figure id="claimed" label="Claimed, not yet built in" value={formatNumber(v.claimed)} />
        <Figure id="built-in" label="Built in" value={`${formatNumber(v.builtIn)} of ${formatNumber(v.cans)}`} />
        <Figure id="to-claim" label="Still to claim" value={formatNumber(toClaim)} />
      </dl>
      <p className="text-sm text-ink-soft">
        The drive has {formatNumber(v.driveUnclaimed)} finished or in-process cans no unit has claimed, {formatNumber(v.drivePunched)} of them punched.
        Building in uses punched cans.
      </p>
      {v.installed ? (
        <Notice title="This heater is on the wall">It takes no more cans.</Notice>
      ) : (
        <div className="grid gap-4 md:grid-cols-3">
          <QuantityAction
            id="claim-quantity"
            label="Claim cans"
            hint="Sets cans aside for this unit"
            initial={Math.max(1, Math.min(toClaim, v.driveUnclaimed))}
            submitLabel="Claim"
            run={(q, key) => postClaimAction(v.unitId, "claims", q, key)}
          />
          <QuantityAction
            id="built-quantity"
            label="Record cans built in"
            hint={`One column is ${v.rows} cans`}
            initial={Math.max(1, Math.min(v.rows, v.claimed))}
            submitLabel="Record built in"
            run={(q, key) => postClaimAction(v.unitId, "built-in", q, key)}
          />
          <QuantityAction
            id="release-quantity"
            label="Release claimed cans"
            hint="Gives them back to the drive"
            initial={Math.max(1, v.claimed)}
            submitLabel="Release"
            variant="secondary"
            run={(q, key) => postClaimAction(v.unitId, "releases", q, key)}
          />
        </div>
      )}
      {v.isOrganiser && v.otherUnits.length > 0 ? (
        <div className="border-t border-paper-edge pt-3">
          <QuantityAction
            id="move-quantity"
            label="Cans to move"
            initial={Math.max(1, v.claimed)}
            submitLabel="Move claim"
            variant="secondary"
            run={(q, key) => moveClaimsTo(v.unitId, moveTo, q, key)}
          >
            <div className="flex flex-col gap-1">
              <label htmlFor="move-to" className="font-semibold">Move claimed cans to</label>
              <select id="move-to" value={moveTo} onChange={(e) => setMoveTo(e.target.value)} className="min-h-11 rounded-lg border-2 border-ink/40 bg-white px-3">
                {v.otherUnits.map((u) => (
                  <option key={u.id} value={u.id}>{u.name}</option>
                ))}
              </select>
            </div>
          </QuantityAction>
        </div>
      ) : null}
    </div>
  );
}

function Figure({ id, label, value }: { id: string; label: string; value: string }) {
  return (
    <div className="flex flex-col">
      <dt className="text-sm text-ink-faint">{label}</dt>
      <dd className="text-lg font-bold" data-figure={id}>{value}</dd>
    </div>
  );
}
