import type { DemoFixture } from "@/tests/support/fixtures";

// One row per route handler method. Each area keeps its rows in
// tests/integration/authz/rows-<area>.ts; authz.test.ts collects them all and
// fails when a route in app/api has a method without a row.
export type Who = "anonymous" | "volunteer" | "builder" | "organiser" | "otherOrganiser";

export const EVERYONE: Who[] = ["anonymous", "volunteer", "builder", "organiser", "otherOrganiser"];

export interface AuthzRow {
  /** The route file relative to the project, e.g. "app/api/drives/[id]/stock/route.ts". */
  route: string;
  method: "GET" | "POST" | "PUT" | "PATCH" | "DELETE";
  /** The concrete URL to call, usually built from the demo group's ids. */
  path: (f: DemoFixture) => string;
  /**
   * Body to send. For mutations prefer a body that is invalid on purpose: an
   * allowed caller then gets 422 (the door opened, input was checked) and
   * nothing is written, while others get 401/403/404 before parsing.
   */
  body?: (f: DemoFixture) => unknown;
  /** Expected status per caller; an array allows any of those statuses. */
  expect: Record<Who, number | number[]>;
  /** Why this row is shaped the way it is, when it is not obvious. */
  note?: string;
}
