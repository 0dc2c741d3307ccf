"use client";

// A number with big − and + buttons for one thumb; typing works too.
export function Stepper({
  id,
  label,
  value,
  onChange,
  step = 1,
  bigStep,
  error,
}: {
  id: string;
  label: string;
  value: number;
  onChange: (n: number) => void;
  step?: number;
  bigStep?: number;
  error?: string;
}) {
  const set = (n: number) => onChange(Math.max(0, Math.round(n)));
  const btn = "min-h-11 min-w-11 rounded-lg border-2 border-ink/60 bg-paper px-2 text-lg font-bold focus-visible:outline-3 focus-visible:outline-ember";
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-semibold">
        {label}
      </label>
      <div className="flex items-center gap-2">
        {bigStep ? (
          <button type="button" className={btn} aria-label={`${label}: minus ${bigStep}`} onClick={() => set(value - bigStep)}>
            −{bigStep}
          </button>
        ) : null}
        <button type="button" className={btn} aria-label={`${label}: minus ${step}`} onClick={() => set(value - step)}>
          −
        </button>
        <input
          id={id}
          inputMode="numeric"
          pattern="[0-9]*"
          className={`min-h-11 w-20 rounded-lg border-2 bg-white px-2 text-center text-lg ${error ? "border-alarm" : "border-ink/40"}`}
          value={String(value)}
          aria-invalid={error ? true : undefined}
          aria-describedby={`${id}-error`}
          onChange={(e) => set(Number(e.target.value.replace(/\D/g, "") || 0))}
        />
        <button type="button" className={btn} aria-label={`${label}: plus ${step}`} onClick={() => set(value + step)}>
          +
        </button>
        {bigStep ? (
          <button type="button" className={btn} aria-label={`${label}: plus ${bigStep}`} onClick={() => set(value + bigStep)}>
            +{bigStep}
          </button>
        ) : null}
      </div>
      <p id={`${id}-error`} aria-live="polite" className="text-sm font-semibold text-alarm">
        {error ?? ""}
      </p>
    </div>
  );
}
