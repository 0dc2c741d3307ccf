import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { ownDrive } from "@/lib/drives/resource";
import { stockCountInputSchema } from "@/lib/ledger/stock-count-schema";
import { recordStockCount } from "@/lib/ledger/record";

export const dynamic = "force-dynamic";

// An organiser's count of a shelf: the ledger is brought to what was counted, with the difference as its own movement.
export const POST = endpoint.idempotent(
  { who: ["organiser"], params: idPath("That drive"), resource: ownDrive, body: stockCountInputSchema, keepsPeople: true },
  async ({ actor, params, body, trx }) => recordStockCount(actor, params.id, body, trx),
);
