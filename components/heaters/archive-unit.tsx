"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/ui/field";
import { useArchiveHeater } from "@/hooks/queries/heaters";
import { formatNumber } from "@/lib/heaters/format";
import { countOf } from "@/lib/plural";

/**
 * Archive or restore a unit, with a confirmation step before archiving. The
 * server applies the same rules (409 when cans are built in); nothing in the
 * ledger is removed either way.
 */
export function ArchiveUnit({ id, archived, claimed, builtIn }: { id: string; archived: boolean; claimed: number; builtIn: number }) {
  const router = useRouter();
  const [asking, setAsking] = useState(false);
  const change = useArchiveHeater(id, { onSuccess: () => { setAsking(false); router.refresh(); } });
  const released = change.data?.released ?? 0;
  if (archived) {
    return (
      <div className="flex flex-col gap-2">
        <FormError message={change.error?.message} />
        <p className="text-ink-soft">This unit is archived: it is hidden from the lists and counts toward no drive target.</p>
        <div>
          <Button type="button" variant="secondary" disabled={change.isPending} onClick={() => change.mutate(false)}>
            Restore this unit
          </Button>
        </div>
      </div>
    );
  }
  if (builtIn > 0) {
    return <p className="text-ink-soft">{countOf(builtIn, "can", formatNumber)} are built into this unit, so it is kept as a real heater and cannot be archived.</p>;
  }
  return (
    <div className="flex flex-col gap-2">
      <FormError message={change.error?.message} />
      {change.data && released > 0 ? (
        <p role="status" className="font-semibold text-moss-deep">{countOf(released, "claimed can", formatNumber)} went back to the drive.</p>
      ) : null}
      {asking ? (
        <>
          <p>
            Archive this unit? It leaves the lists and the drive&apos;s target
            {claimed > 0 ? `, and its ${countOf(claimed, "claimed can", formatNumber)} go back to the drive` : ""}. The ledger keeps every line; you can
            restore the unit later.
          </p>
          <div className="flex flex-wrap gap-2">
            <Button type="button" variant="danger" disabled={change.isPending} onClick={() => change.mutate(true)}>
              Yes, archive it
            </Button>
            <Button type="button" variant="secondary" onClick={() => setAsking(false)}>
              Keep it
            </Button>
          </div>
        </>
      ) : (
        <div>
          <Button type="button" variant="secondary" onClick={() => setAsking(true)}>
            Archive this unit…
          </Button>
        </div>
      )}
    </div>
  );
}
