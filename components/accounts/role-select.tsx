import type { SelectHTMLAttributes } from "react";
import { SelectField } from "@/components/ui/field";
import { ROLES, ROLE_LABEL } from "@/lib/auth/roles";

const ROLE_CHOICES = ROLES.map((r) => ({ value: r, label: ROLE_LABEL[r] }));

export function RoleSelect({ id, label, error, ...select }: SelectHTMLAttributes<HTMLSelectElement> & { id: string; label: string; error?: string }) {
  return <SelectField id={id} label={label} error={error} options={ROLE_CHOICES} {...select} />;
}

export { ROLE_CHOICES };

export const ROLE_HELP = {
  organiser: "runs the group: drives, drop points, people",
  volunteer: "logs pickups, sorting and processing",
  builder: "plans heater units and claims cans",
} as const;
