import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { driveStock } from "@/lib/ledger/balances";

export const dynamic = "force-dynamic";

// No separate resolver: driveStock reads the totals by drive *and* group in one query (another group's is 404).
export const GET = endpoint({ who: "member", params: idPath("That drive") }, async ({ actor, params }) => driveStock(actor.group.id, params.id));
