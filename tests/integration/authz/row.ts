import type { DemoFixture } from "@/tests/support/fixtures";
import type { AuthzRow, Who } from "./types";

// Small builders so each route's row is declared once, on a line or two.
type Status = number | number[];

/** Expected statuses in EVERYONE's order: anonymous, volunteer, builder, organiser, otherOrganiser. */
export function expects(anonymous: Status, volunteer: Status, builder: Status, organiser: Status, otherOrganiser: Status): Record<Who, Status> {
  return { anonymous, volunteer, builder, organiser, otherOrganiser };
}

/** The same status for every caller. */
export const everyone = (status: Status) => expects(status, status, status, status, status);

/**
 * One row. `route` is the folder under app/api ("drives/[id]" names
 * app/api/drives/[id]/route.ts); a string `path` is the URL as it is.
 */
export function row(
  method: AuthzRow["method"],
  route: string,
  path: string | ((f: DemoFixture) => string),
  expect: Record<Who, Status>,
  more: Pick<AuthzRow, "body" | "note"> = {},
): AuthzRow {
  return { route: `app/api/${route}/route.ts`, method, path: typeof path === "string" ? () => path : path, expect, ...more };
}
