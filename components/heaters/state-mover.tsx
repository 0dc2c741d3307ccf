"use client";

import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/ui/field";
import { useMoveHeater } from "@/hooks/queries/heaters";
import { formatNumber } from "@/lib/heaters/format";
import { HEATER_STATE_LABEL, stateIndexOf, type HeaterState } from "@/lib/heaters/unit-schemas";
import { countOf } from "@/lib/plural";

/** Buttons for the state moves this person may make; the server checks the same rule. */
export function StateMover({ id, state, moves, refusal }: { id: string; state: HeaterState; moves: HeaterState[]; refusal?: string | null }) {
  const router = useRouter();
  const move = useMoveHeater(id, { onSuccess: () => router.refresh() });
  const released = move.data?.released ?? 0;
  const done = move.data ? (
    <p role="status" className="font-semibold text-moss-deep">
      Now “{HEATER_STATE_LABEL[move.data.state]}”.
      {released > 0 ? ` ${countOf(released, "claimed can", formatNumber)} not built in went back to the drive.` : ""}
    </p>
  ) : null;
  if (refusal) return <p className="text-ink-soft">{refusal}</p>;
  if (moves.length === 0) return <>{done}<p className="text-ink-soft">No state change is open to you from here.</p></>;
  return (
    <div className="flex flex-col gap-2">
      <FormError message={move.error?.message} />
      {done}
      <div className="flex flex-wrap gap-2">
        {moves.map((to) => {
          const back = stateIndexOf(to) < stateIndexOf(state);
          return (
            <Button key={to} type="button" variant={back ? "secondary" : "primary"} disabled={move.isPending} onClick={() => move.mutate(to)}>
              {back ? `Move back to “${HEATER_STATE_LABEL[to]}”` : `Mark “${HEATER_STATE_LABEL[to]}”`}
            </Button>
          );
        })}
      </div>
      {moves.includes("installed") && state !== "installed" ? (
        <p className="text-sm text-ink-faint">Marking it on the wall gives any claimed cans not built in back to the drive.</p>
      ) : null}
    </div>
  );
}
