import type { InputHTMLAttributes, ReactNode } from "react";

// A labelled input whose error is announced and tied to it with aria-describedby.
export function Field({
  id,
  label,
  error,
  hint,
  className = "",
  ...input
}: InputHTMLAttributes<HTMLInputElement> & { id: string; label: ReactNode; error?: string; hint?: ReactNode }) {
  const describedBy = [hint ? `${id}-hint` : null, `${id}-error`].filter(Boolean).join(" ");
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="font-semibold">
        {label}
      </label>
      {hint ? (
        <p id={`${id}-hint`} className="text-sm text-ink-faint">
          {hint}
        </p>
      ) : null}
      <input
        id={id}
        name={input.name ?? id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={`min-h-11 rounded-lg border-2 bg-white px-3 py-2 text-ink ${error ? "border-alarm" : "border-ink/40"}`}
        {...input}
      />
      <p id={`${id}-error`} aria-live="polite" className="min-h-0 text-sm font-semibold text-alarm">
        {error ?? ""}
      </p>
    </div>
  );
}

export function FormError({ message }: { message?: string | null }) {
  if (!message) return null;
  return (
    <p role="alert" className="rounded-lg border-2 border-alarm bg-alarm-soft px-3 py-2 font-semibold text-alarm">
      {message}
    </p>
  );
}
