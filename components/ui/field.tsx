import type { InputHTMLAttributes, ReactNode, SelectHTMLAttributes, TextareaHTMLAttributes } from "react";

// The app's one set of form fields: a text box (Field), a select (SelectField),
// a textarea (TextareaField), a radio group (RadioGroup); counts and weights use
// NumberField (number-field.tsx). Each has its label, an optional hint and an
// error line announced politely, tied to the control the same way:
// aria-describedby = "<id>-hint <id>-error", aria-invalid while there is an error.

interface FieldBits {
  id: string;
  label: ReactNode;
  error?: string;
  hint?: ReactNode;
  className?: string;
}

const box = (error?: string) => `min-h-11 rounded-lg border-2 bg-white px-3 py-2 text-ink ${error ? "border-alarm" : "border-ink/40"}`;

/** The ids a control is described by: its hint (when there is one) and its error line. */
export function describedBy(id: string, hint?: ReactNode): string {
  return [hint ? `${id}-hint` : null, `${id}-error`].filter(Boolean).join(" ");
}

function Hint({ id, hint }: { id: string; hint?: ReactNode }) {
  return hint ? (
    <p id={`${id}-hint`} className="text-sm text-ink-faint">
      {hint}
    </p>
  ) : null;
}

export function FieldError({ id, error }: { id: string; error?: string }) {
  return (
    <p id={`${id}-error`} aria-live="polite" className="min-h-0 text-sm font-semibold text-alarm">
      {error ?? ""}
    </p>
  );
}

function Shell({ id, label, hint, error, className = "", children }: Omit<FieldBits, "id"> & { id: string; children: ReactNode }) {
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="font-semibold">
        {label}
      </label>
      <Hint id={id} hint={hint} />
      {children}
      <FieldError id={id} error={error} />
    </div>
  );
}

/** A labelled text input (any `type` but number boxes: those are NumberField). */
export function Field({ id, label, error, hint, className, ...input }: InputHTMLAttributes<HTMLInputElement> & FieldBits) {
  return (
    <Shell id={id} label={label} hint={hint} error={error} className={className}>
      <input id={id} name={input.name ?? id} aria-invalid={error ? true : undefined} aria-describedby={describedBy(id, hint)} className={box(error)} {...input} />
    </Shell>
  );
}

export interface Choice {
  value: string;
  label: ReactNode;
}

/** A labelled native select. `placeholder` adds a first empty choice ("Choose a drop point…"). */
export function SelectField({
  id,
  label,
  error,
  hint,
  className,
  options,
  placeholder,
  children,
  ...select
}: SelectHTMLAttributes<HTMLSelectElement> & FieldBits & { options?: readonly Choice[]; placeholder?: string }) {
  return (
    <Shell id={id} label={label} hint={hint} error={error} className={className}>
      <SelectBox id={id} error={error} hint={hint} options={options} placeholder={placeholder} {...select}>
        {children}
      </SelectBox>
    </Shell>
  );
}

/** The select alone, wired the same way, for a label that sits elsewhere (a table's column, a toolbar): pass aria-label or aria-labelledby. */
export function SelectBox({
  id,
  error,
  hint,
  options,
  placeholder,
  children,
  className,
  ...select
}: SelectHTMLAttributes<HTMLSelectElement> & { id: string; error?: string; hint?: ReactNode; options?: readonly Choice[]; placeholder?: string }) {
  return (
    <select
      id={id}
      name={select.name ?? id}
      aria-invalid={error ? true : undefined}
      aria-describedby={error !== undefined || hint ? describedBy(id, hint) : undefined}
      className={`${box(error)} ${className ?? ""}`}
      {...select}
    >
      {placeholder !== undefined ? <option value="">{placeholder}</option> : null}
      {options?.map((o) => (
        <option key={o.value} value={o.value}>
          {o.label}
        </option>
      ))}
      {children}
    </select>
  );
}

export function TextareaField({ id, label, error, hint, className, ...area }: TextareaHTMLAttributes<HTMLTextAreaElement> & FieldBits) {
  return (
    <Shell id={id} label={label} hint={hint} error={error} className={className}>
      <textarea id={id} name={area.name ?? id} aria-invalid={error ? true : undefined} aria-describedby={describedBy(id, hint)} className={box(error)} {...area} />
    </Shell>
  );
}

/** Radio buttons in a fieldset whose legend is the label (the radiogroup inside carries aria-invalid and the descriptions); controlled (`value` + `onChange`) or not (`defaultValue`). */
export function RadioGroup({
  id,
  label,
  error,
  hint,
  className = "",
  name,
  options,
  value,
  defaultValue,
  onChange,
}: FieldBits & { name: string; options: readonly Choice[]; value?: string; defaultValue?: string; onChange?: (value: string) => void }) {
  return (
    <fieldset id={id} className={`flex flex-col gap-1 ${className}`}>
      <legend id={`${id}-label`} className="font-semibold">
        {label}
      </legend>
      <Hint id={id} hint={hint} />
      <div role="radiogroup" aria-labelledby={`${id}-label`} aria-describedby={describedBy(id, hint)} aria-invalid={error ? true : undefined} className="mt-1 flex flex-col gap-1">
        {options.map((o) => (
          <label key={o.value} className="flex min-h-11 items-center gap-2">
            <input
              type="radio"
              name={name}
              value={o.value}
              {...(value !== undefined ? { checked: value === o.value, onChange: () => onChange?.(o.value) } : { defaultChecked: defaultValue === o.value })}
              className="h-5 w-5"
            />
            {o.label}
          </label>
        ))}
      </div>
      <FieldError id={id} error={error} />
    </fieldset>
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
