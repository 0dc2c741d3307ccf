import { everyone, row } from "./row";
import type { AuthzRow } from "./types";

export const rows: AuthzRow[] = [
  {
    ...row("GET", "bench/naive-stock/[id]", (f) => `/api/bench/naive-stock/${f.demoDriveId}`, everyone(404), {
      note: "the benchmark's naive reference is built (and answers) only with CANTROVE_BENCH=1",
    }),
    route: "app/api/bench/naive-stock/[id]/route.bench.ts",
  },
];
