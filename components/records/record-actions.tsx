"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/ui/field";
import { useRecordAction } from "@/hooks/queries/drive-writes";
import { recordNoun, type RecordKind } from "@/lib/records/kinds";

/**
 * Archive, restore and delete for one record (issue 16). Archiving is undone by
 * restoring, so it takes one press; deleting cannot be undone, so it asks first
 * and is offered only on an archived record. The server applies the same rules:
 * 409 while any ledger line refers to it (the message says so, and the record stays).
 */
export function RecordActions({
  kind,
  id,
  name,
  archived,
  deletable = true,
  afterDelete,
  compact = false,
}: {
  kind: RecordKind;
  id: string;
  /** What the buttons name for a screen reader ("Archive the pledge of 2 bags…"). */
  name: string;
  archived: boolean;
  deletable?: boolean;
  /** Where to go once deleted (the record's own page is gone); else the page refreshes. */
  afterDelete?: string;
  compact?: boolean;
}) {
  const router = useRouter();
  const [asking, setAsking] = useState(false);
  const act = useRecordAction({
    onSuccess: (_data, v) => {
      setAsking(false);
      if (v.action === "delete" && afterDelete) router.push(afterDelete);
      else router.refresh();
    },
  });
  const noun = recordNoun(kind);
  const run = (action: "archive" | "restore" | "delete") => act.mutate({ kind, id, action });
  return (
    <div className={`flex flex-col gap-2 ${compact ? "mt-1" : ""}`}>
      <FormError message={act.error?.message} />
      {asking ? (
        <div className="flex flex-col gap-2 rounded-lg border-2 border-alarm p-3" role="group" aria-label={`Delete ${name}?`}>
          <p>
            Delete {name} for good? This cannot be undone. Anything the ledger refers to is kept and cannot be deleted; archive it instead.
          </p>
          <div className="flex flex-wrap gap-2">
            <Button type="button" variant="danger" disabled={act.isPending} onClick={() => run("delete")}>
              Yes, delete it for good
            </Button>
            <Button type="button" variant="secondary" onClick={() => setAsking(false)}>
              Keep it
            </Button>
          </div>
        </div>
      ) : (
        <div className="flex flex-wrap gap-2">
          {archived ? (
            <Button type="button" variant="secondary" disabled={act.isPending} onClick={() => run("restore")} aria-label={`Restore ${name}`}>
              Restore
            </Button>
          ) : (
            <Button type="button" variant="secondary" disabled={act.isPending} onClick={() => run("archive")} aria-label={compact ? `Archive ${name}` : undefined}>
              {compact ? "Archive" : `Archive this ${noun}`}
            </Button>
          )}
          {archived && deletable ? (
            <Button type="button" variant="quiet" onClick={() => setAsking(true)} aria-label={`Delete ${name}`}>
              Delete
            </Button>
          ) : null}
        </div>
      )}
    </div>
  );
}
