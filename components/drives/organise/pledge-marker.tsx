"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { FormError, SelectField } from "@/components/ui/field";
import { fetchJson } from "@/lib/api/client";
import type { PledgeStatus } from "@/lib/drives/schemas";

/**
 * The organiser's marks for one pledge; POST /api/pledges/{id}/status applies the
 * same rules. "Received" may name the haul that brought it (hauls of the pledge's
 * drop point, newest first), or none.
 */
export function PledgeMarker({ id, status, label, hauls = [] }: { id: string; status: PledgeStatus; label: string; hauls?: readonly { value: string; label: string }[] }) {
  const router = useRouter();
  const [error, setError] = useState<string | undefined>();
  const [pending, setPending] = useState(false);
  const [haulId, setHaulId] = useState("");
  if (status === "cancelled") return null;
  const send = async (to: Exclude<PledgeStatus, "cancelled">) => {
    setPending(true);
    setError(undefined);
    try {
      const json = to === "received" && haulId ? { status: to, haulId } : { status: to };
      await fetchJson(`/api/pledges/${id}/status`, { method: "POST", json });
      router.refresh();
    } catch (e) {
      setError(e instanceof Error ? e.message : "That did not work; try again.");
    } finally {
      setPending(false);
    }
  };
  return (
    <div className="mt-1 flex flex-col gap-1">
      <FormError message={error} />
      {status === "pledged" && hauls.length > 0 ? (
        <SelectField
          id={`pledge-haul-${id}`}
          label="Brought in by (optional)"
          hint="A haul from this drop point, if you know which"
          value={haulId}
          onChange={(e) => setHaulId(e.target.value)}
          placeholder="Not known"
          options={hauls}
        />
      ) : null}
      <div className="flex flex-wrap gap-2" role="group" aria-label={`Mark the pledge: ${label}`}>
        {status === "pledged" ? (
          <>
            <Button type="button" variant="secondary" disabled={pending} onClick={() => send("received")}>
              Received
            </Button>
            <Button type="button" variant="quiet" disabled={pending} onClick={() => send("notBrought")}>
              Not brought
            </Button>
          </>
        ) : (
          <Button type="button" variant="quiet" disabled={pending} onClick={() => send("pledged")}>
            Undo the mark
          </Button>
        )}
      </div>
    </div>
  );
}
