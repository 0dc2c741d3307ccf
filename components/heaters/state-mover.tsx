"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/ui/field";
import { moveHeater, heaterKeys } from "@/hooks/queries/heaters";
import { HEATER_STATE_LABEL, stateIndexOf, type HeaterState } from "@/lib/heaters/unit-schemas";

/** Buttons for the state moves this person may make; the server checks the same rule. */
export function StateMover({ id, state, moves }: { id: string; state: HeaterState; moves: HeaterState[] }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const move = useMutation({
    mutationFn: (to: HeaterState) => moveHeater(id, to),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: heaterKeys.all });
      router.refresh();
    },
  });
  if (moves.length === 0) return <p className="text-ink-soft">No state change is open to you from here.</p>;
  return (
    <div className="flex flex-col gap-2">
      <FormError message={move.error?.message} />
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
    </div>
  );
}
