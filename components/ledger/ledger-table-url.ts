"use client";

import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useCallback, useMemo } from "react";
import { putCurrentDrive } from "@/hooks/queries/current-drive";

// The ledger's filters live in the address (?driveId=…&stage=…), so a filtered
// view can be bookmarked or shared and Back/Forward step through the filters.
export const LEDGER_FILTER_KEYS = ["driveId", "dropPointId", "stage", "personId", "from", "to"] as const;
export type LedgerFilterKey = (typeof LEDGER_FILTER_KEYS)[number];

export function useLedgerFilters(defaultDriveId: string) {
  const params = useSearchParams();
  const router = useRouter();
  const pathname = usePathname();
  const filters = useMemo(() => {
    const f: Partial<Record<LedgerFilterKey, string>> = {};
    for (const k of LEDGER_FILTER_KEYS) {
      const v = params.get(k);
      if (v) f[k] = v;
    }
    // "All drives" is an explicit choice (driveId=all); no driveId at all means the page's drive.
    if (f.driveId === "all") delete f.driveId;
    else if (!params.has("driveId") && defaultDriveId) f.driveId = defaultDriveId;
    return f;
  }, [params, defaultDriveId]);

  const set = useCallback(
    (key: LedgerFilterKey, value: string) => {
      const next = new URLSearchParams(params.toString());
      next.delete("drive");
      if (key === "driveId") {
        // Choosing one drive here makes it the person's drive on the other pages too
        // (the address already names it for this one, so a failure loses nothing).
        if (value) void putCurrentDrive(value).catch(() => undefined);
        next.set("driveId", value || "all");
        next.delete("dropPointId");
      } else if (value) next.set(key, value);
      else next.delete(key);
      if (!next.has("driveId") && defaultDriveId) next.set("driveId", defaultDriveId);
      router.push(`${pathname}?${next.toString()}`, { scroll: false });
    },
    [params, router, pathname, defaultDriveId],
  );

  const query = useMemo(() => new URLSearchParams(filters as Record<string, string>).toString(), [filters]);
  return { filters, set, query };
}
