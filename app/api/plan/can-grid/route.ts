import { endpoint } from "@/lib/api/endpoint";
import { computeCanGrid } from "@/lib/heaters/can-grid";
import { canGridInputSchema } from "@/lib/heaters/schemas";

export const dynamic = "force-dynamic";

// Open to anyone: the planner works without an account. A pure computation,
// so an Idempotency-Key header is accepted and simply has nothing to guard.
export const POST = endpoint({ who: "anyone", body: canGridInputSchema }, async ({ body }) => computeCanGrid(body));
