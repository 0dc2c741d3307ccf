import { endpoint } from "@/lib/api/endpoint";
import { slugPath } from "@/lib/api/path";
import { publicDrive } from "@/lib/drives/resource";
import { dropPointTallies } from "@/lib/ledger/balances";

export const dynamic = "force-dynamic";

/** Live tallies per drop point of a public drive: counts only, no contact data. */
export const GET = endpoint({ who: "anyone", params: slugPath(), resource: publicDrive }, async ({ resource }) => dropPointTallies(resource.id));
