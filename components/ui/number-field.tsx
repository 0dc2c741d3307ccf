"use client";

import type { ReactNode } from "react";
import { numberError, stepNumberInput, type NumberSpec } from "@/lib/forms/number-input";

const stepButton =
  "min-h-11 min-w-11 rounded-lg border-2 border-ink/60 bg-paper px-2 text-lg font-bold focus-visible:outline-3 focus-visible:outline-ember disabled:opacity-40";

interface NumberInputProps {
  id: string;
  value: string;
  onChange: (raw: string) => void;
  spec: NumberSpec;
  /** The form's own error (a required box left empty on submit, or the server's answer). */
  error?: string;
  /** Name for the − / + buttons: "Bags: plus 1". */
  name: string;
  /** The form field's name when posted (a server action's FormData); the id otherwise. */
  fieldName?: string;
  hintId?: string;
  /** Big − and + buttons for one thumb (bags, cans). */
  steppers?: boolean;
  step?: number;
  bigStep?: number;
  /** Width and alignment of the box itself. */
  boxClassName?: string;
}

/**
 * The box of a count or a weight, with its message. It shows exactly what
 * was typed (the raw string is the state) and says beside it, as soon as it
 * is typed, when that is not a number the box takes; what is typed wins over
 * the form's `error` while it is wrong. type="text" with inputMode keeps a
 * phone's number pad without the browser dropping what it can't read.
 */
export function NumberInput({ id, value, onChange, spec, error, name, fieldName, hintId, steppers = false, step = 1, bigStep, boxClassName }: NumberInputProps) {
  const typedError = value.trim() === "" ? undefined : numberError(value, spec);
  const shown = typedError ?? error;
  const canStep = stepNumberInput(value, spec, 0) !== null;
  const button = (by: number) => (
    <button
      type="button"
      className={stepButton}
      aria-label={`${name}: ${by < 0 ? "minus" : "plus"} ${Math.abs(by)}`}
      disabled={!canStep}
      onClick={() => {
        const next = stepNumberInput(value, spec, by);
        if (next !== null) onChange(next);
      }}
    >
      {by < 0 ? "−" : "+"}
      {Math.abs(by) === 1 ? "" : Math.abs(by)}
    </button>
  );
  const box = (
    <input
      id={id}
      name={fieldName ?? id}
      type="text"
      inputMode={spec.decimal ? "decimal" : "numeric"}
      autoComplete="off"
      value={value}
      onChange={(e) => onChange(e.target.value)}
      aria-invalid={shown ? true : undefined}
      aria-describedby={[hintId, `${id}-error`].filter(Boolean).join(" ")}
      className={`min-h-11 rounded-lg border-2 bg-white py-2 text-ink ${boxClassName ?? (steppers ? "w-24 px-2 text-center text-lg" : "px-3")} ${shown ? "border-alarm" : "border-ink/40"}`}
    />
  );
  return (
    <>
      {steppers ? (
        <div className="flex items-center gap-2">
          {bigStep ? button(-bigStep) : null}
          {button(-step)}
          {box}
          {button(step)}
          {bigStep ? button(bigStep) : null}
        </div>
      ) : (
        box
      )}
      <p id={`${id}-error`} aria-live="polite" className="text-sm font-semibold text-alarm">
        {shown ?? ""}
      </p>
    </>
  );
}

/** A labelled NumberInput: the one field for every count and weight in the app. */
export function NumberField({
  label,
  hint,
  className = "",
  ...input
}: Omit<NumberInputProps, "name" | "hintId"> & { label: string; hint?: ReactNode; className?: string }) {
  const hintId = hint ? `${input.id}-hint` : undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={input.id} className="font-semibold">
        {label}
      </label>
      {hint ? (
        <p id={hintId} className="text-sm text-ink-faint">
          {hint}
        </p>
      ) : null}
      <NumberInput {...input} name={label} hintId={hintId} />
    </div>
  );
}
