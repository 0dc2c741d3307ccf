import type { AuthzRow } from "./types";

export const rows: AuthzRow[] = [
  {
    route: "app/api/bench/naive-stock/[id]/route.bench.ts",
    method: "GET",
    path: (f) => `/api/bench/naive-stock/${f.demoDriveId}`,
    expect: { anonymous: 404, volunteer: 404, builder: 404, organiser: 404, otherOrganiser: 404 },
    note: "the benchmark's naive reference is built (and answers) only with CANTROVE_BENCH=1",
  },
];
