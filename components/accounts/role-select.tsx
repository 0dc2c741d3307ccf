import type { SelectHTMLAttributes } from "react";
import { ROLES, ROLE_LABEL } from "@/lib/auth/roles";

export function RoleSelect({ id, label, error, ...select }: SelectHTMLAttributes<HTMLSelectElement> & { id: string; label: string; error?: string }) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-semibold">
        {label}
      </label>
      <select
        id={id}
        name={select.name ?? id}
        aria-invalid={error ? true : undefined}
        aria-describedby={`${id}-error`}
        className={`min-h-11 rounded-lg border-2 bg-white px-3 py-2 text-ink ${error ? "border-alarm" : "border-ink/40"}`}
        {...select}
      >
        {ROLES.map((r) => (
          <option key={r} value={r}>
            {ROLE_LABEL[r]}
          </option>
        ))}
      </select>
      <p id={`${id}-error`} aria-live="polite" className="text-sm font-semibold text-alarm">
        {error ?? ""}
      </p>
    </div>
  );
}

export const ROLE_HELP = {
  organiser: "runs the group: drives, drop points, people",
  volunteer: "logs pickups, sorting and processing",
  builder: "plans heater units and claims cans",
} as const;
