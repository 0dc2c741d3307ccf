"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { useClearFullBin } from "@/hooks/queries/drive-writes";
import { LEVEL_LABEL, timeAgo } from "@/lib/drives/fill";
import type { FullBin } from "@/lib/drives/types";
import { useFormat } from "@/hooks/use-look";
import { NBSP } from "@/lib/format";
import { countOf } from "@/lib/plural";

/** Every bin full now, once each; a haul from it or "Clear" takes it off the list. */
export function FullBins({ bins }: { bins: FullBin[] }) {
  const router = useRouter();
  const f = useFormat();
  const [cleared, setCleared] = useState<string[]>([]);
  const clear = useClearFullBin({
    onSuccess: (_data, b) => {
      setCleared((c) => [...c, `${b.dropPointId}@${b.reportedAt}`]);
      router.refresh();
    },
  });
  const shown = bins.filter((b) => !cleared.includes(`${b.dropPointId}@${b.reportedAt}`));
  if (shown.length === 0) return null;
  return (
    <div className="mt-4" data-testid="full-bins">
      <Notice tone="caution" title={`${countOf(shown.length, "bin")} reported full`}>
        <ul className="flex flex-col gap-1">
          {shown.map((b) => (
            <li key={b.dropPointId} className="flex flex-wrap items-center justify-between gap-2" data-testid="full-bin">
              <span>
                <strong>{b.dropPointName}</strong>: {LEVEL_LABEL[b.level] ?? `${b.level}${NBSP}%`},{" "}
                <time dateTime={b.reportedAt} title={f.moment(b.reportedAt)}>
                  reported {timeAgo(b.reportedAt)}
                </time>
              </span>
              <Button variant="secondary" onClick={() => clear.mutate(b)} disabled={clear.isPending} aria-label={`Clear the full report for ${b.dropPointName}`}>
                Clear
              </Button>
            </li>
          ))}
        </ul>
        <p className="mt-1 text-sm">A haul from a bin clears it. Clear it here when it was emptied another way or the report was wrong.</p>
        {clear.isError ? <p role="alert" className="text-alarm">Could not clear it: {clear.error.message}</p> : null}
      </Notice>
    </div>
  );
}
