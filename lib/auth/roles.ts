// Safe to import in the client: the roles and where each one lands.
export const ROLES = ["organiser", "volunteer", "builder"] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABEL: Record<Role, string> = {
  organiser: "Organiser",
  volunteer: "Volunteer",
  builder: "Builder",
};

export const ROLE_HOME: Record<Role, string> = {
  organiser: "/dashboard",
  volunteer: "/log",
  builder: "/units",
};
