import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { ownDrive } from "@/lib/drives/resource";
import { sortInputSchema } from "@/lib/ledger/schemas";
import { recordSort } from "@/lib/ledger/record";

export const dynamic = "force-dynamic";

export const POST = endpoint.idempotent(
  { who: ["volunteer", "organiser"], params: idPath("That drive"), resource: ownDrive, body: sortInputSchema, keepsPeople: true },
  async ({ actor, params, body, trx }) => recordSort(actor, params.id, body, trx),
);
