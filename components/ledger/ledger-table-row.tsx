"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { useUndoMovement } from "@/hooks/queries/ledger";
import { useFormat } from "@/hooks/use-look";
import { entryLabel, kindLabel, lineLabel, moveLabel, reasonLabel } from "@/lib/ledger/labels";
import { sentLabel } from "@/lib/ledger/entry-time";
import type { LedgerRow } from "@/lib/ledger/ledger-row";
import { newKey } from "@/lib/api/idempotency-key";

const cell = "px-2 py-1 align-top";

/** One ledger line; an organiser can undo the entry it belongs to (anyone's), with a reason. */
export function LedgerLine({ r, siblings, showDrive }: { r: LedgerRow; siblings: string[]; showDrive: boolean }) {
  const [asking, setAsking] = useState(false);
  const f = useFormat();
  const undoable = r.kind !== "reversal" && !r.reversedById;
  const sent = sentLabel(r.occurredAt, r.recordedAt, f.look);
  return (
    <>
      <tr className={r.reversesId ? "bg-paper-deep" : ""} data-line={r.id}>
        <td className={`${cell} whitespace-nowrap tabular-nums font-semibold`}>{r.id}</td>
        <td className={`${cell} whitespace-nowrap`}>
          {f.moment(r.occurredAt)}
          {/* An entry kept offline is shown at when it happened, and when it reached the server. */}
          {sent ? <span className="block text-sm text-ink-faint">{sent}</span> : null}
        </td>
        <td className={cell}>
          {entryLabel(r.kind, r.reversesId)}
          {r.reversedById ? <span className="block text-sm text-ink-faint">undone by {lineLabel(r.reversedById)}</span> : null}
          {r.reversalReason ? <span className="block text-sm text-ink-soft">Reason: {r.reversalReason}</span> : null}
        </td>
        <td className={`${cell} ${showDrive ? "" : "hidden"}`}>{r.drive}</td>
        <td className={cell}>{r.dropPoint ?? r.heaterUnit ?? ""}</td>
        <td className={cell}>{moveLabel(r.from, r.to)}</td>
        <td className={`${cell} tabular-nums`}>
          {r.isEstimate ? <abbr title="estimate">≈</abbr> : null}
          {f.number(r.quantity)}
        </td>
        <td className={cell}>{reasonLabel(r.reason)}</td>
        <td className={cell}>{r.person}</td>
        <td className={cell}>
          {undoable && !asking ? (
            <Button variant="quiet" onClick={() => setAsking(true)} aria-label={`Undo ${lineLabel(r.id)}`}>
              Undo…
            </Button>
          ) : null}
        </td>
      </tr>
      {asking ? (
        <tr>
          <td colSpan={10} className="bg-paper-deep px-2 py-2">
            <UndoForm row={r} lines={siblings} onClose={() => setAsking(false)} />
          </td>
        </tr>
      ) : null}
    </>
  );
}

function UndoForm({ row, lines, onClose }: { row: LedgerRow; lines: string[]; onClose: () => void }) {
  const [reason, setReason] = useState("");
  const f = useFormat();
  const undo = useUndoMovement({ onSuccess: () => onClose() });
  const which = lines.length > 1 ? `lines ${lines.join(", ")}` : lineLabel(row.id);
  return (
    <form
      aria-label={`Undo ${lineLabel(row.id)}`}
      className="flex flex-col gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        if (reason.trim()) undo.mutate({ movementId: row.movementId, reason, idempotencyKey: newKey() });
      }}
    >
      <p className="font-semibold">
        Undo the {kindLabel(row.kind)} {row.person} recorded on {f.moment(row.occurredAt)} ({which})?
      </p>
      <p className="text-sm text-ink-soft">A new entry runs the other way; both stay in the ledger with your reason.</p>
      <label className="flex flex-col text-sm font-semibold">
        Reason
        <input className="min-h-11 rounded-lg border-2 border-ink/40 bg-white px-2" value={reason} maxLength={300} required onChange={(e) => setReason(e.target.value)} />
      </label>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" variant="danger" disabled={undo.isPending || !reason.trim()}>
          {undo.isPending ? "Undoing…" : "Undo this entry"}
        </Button>
        <Button type="button" variant="secondary" onClick={onClose}>
          Keep it
        </Button>
      </div>
      {undo.isError ? <p role="alert" className="text-alarm">Could not undo it: {undo.error.message}</p> : null}
    </form>
  );
}
