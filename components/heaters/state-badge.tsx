import { HEATER_STATE_LABEL, type HeaterState } from "@/lib/heaters/unit-schemas";

const TONE: Record<HeaterState, string> = {
  planned: "bg-paper-deep text-ink",
  claiming: "bg-sun-soft text-sun",
  building: "bg-ember-soft text-ember-deep",
  installed: "bg-moss-soft text-moss-deep",
};

export function StateBadge({ state }: { state: HeaterState }) {
  return (
    <span className={`inline-block rounded-full px-3 py-0.5 text-sm font-semibold ${TONE[state]}`} data-state={state}>
      {HEATER_STATE_LABEL[state]}
    </span>
  );
}
