import { endpoint } from "@/lib/api/endpoint";
import { notFound } from "@/lib/api/errors";
import { idPath } from "@/lib/api/path";
import { requireUser } from "@/lib/auth/session";
import { benchRoutesEnabled, naiveStock } from "@/lib/bench/naive-stock";

export const dynamic = "force-dynamic";

// Built only with CANTROVE_BENCH=1 (npm run bench; the ".bench.ts" page extension in
// next.config.mjs). The server must also be started with it: a bench build served
// without it answers 404 for everyone, before any sign-in is asked for.
export const GET = endpoint({ who: "anyone", params: idPath("That drive") }, async ({ params }) => {
  if (!benchRoutesEnabled()) throw notFound("That page");
  const actor = await requireUser();
  return naiveStock(actor.group.id, params.id);
});
