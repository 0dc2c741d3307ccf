import { endpoint } from "@/lib/api/endpoint";
import { searchQuerySchema } from "@/lib/search/schemas";
import { searchGroup } from "@/lib/search/queries";

export const dynamic = "force-dynamic";

// No resource: every part of the search filters by the actor's group in SQL.
export const GET = endpoint({ who: ["organiser"], query: searchQuerySchema }, async ({ actor, query }) => ({
  q: query.q,
  results: await searchGroup(actor.group.id, query.q),
}));
