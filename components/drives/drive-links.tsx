"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { putCurrentDrive } from "@/hooks/queries/current-drive";

/**
 * The drive switcher of the ledger and stock-count pages: plain links (they work
 * without script and can be opened in a new tab), and a click remembers the
 * drive first so the next page where cans are entered opens on it too.
 */
export function DriveLinks({ drives, currentId, path, param }: { drives: { id: string; name: string }[]; currentId: string; path: string; param: string }) {
  const router = useRouter();
  const href = (id: string) => `${path}?${param}=${encodeURIComponent(id)}`;
  const [busy, setBusy] = useState<string | null>(null);
  return (
    <nav aria-label="Drive" className="flex flex-wrap gap-3">
      {drives.map((d) => (
        <a
          key={d.id}
          href={href(d.id)}
          aria-current={d.id === currentId ? "page" : undefined}
          aria-busy={busy === d.id || undefined}
          className={`tap ${d.id === currentId ? "font-bold text-ink" : ""}`}
          onClick={async (e) => {
            if (e.metaKey || e.ctrlKey || e.shiftKey || e.altKey || e.button !== 0) return;
            e.preventDefault();
            setBusy(d.id);
            // Remembering is a convenience: the address names the drive either way, so a slow
            // or failed answer never holds the person on this page for long.
            await putCurrentDrive(d.id, AbortSignal.timeout(4_000)).catch(() => undefined);
            setBusy(null);
            router.push(href(d.id));
          }}
        >
          {d.name}
        </a>
      ))}
    </nav>
  );
}
