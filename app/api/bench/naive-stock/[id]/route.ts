import { endpoint } from "@/lib/api/endpoint";
import { notFound } from "@/lib/api/errors";
import { idPath } from "@/lib/api/path";
import { requireUser } from "@/lib/auth/session";
import { benchRoutesEnabled, naiveStock } from "@/lib/bench/naive-stock";

export const dynamic = "force-dynamic";

// Exists only when the server was started with CANTROVE_BENCH=1 (npm run bench): 404 for
// everyone otherwise, before any sign-in is asked for, as for a path that does not exist.
export const GET = endpoint({ who: "anyone", params: idPath("That drive") }, async ({ params }) => {
  if (!benchRoutesEnabled()) throw notFound("That page");
  const actor = await requireUser();
  return naiveStock(actor.group.id, params.id);
});
