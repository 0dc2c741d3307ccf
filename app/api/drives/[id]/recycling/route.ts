import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { ownDrive } from "@/lib/drives/resource";
import { recyclingInputSchema } from "@/lib/ledger/schemas";
import { recordRecycling } from "@/lib/ledger/record";

export const dynamic = "force-dynamic";

export const POST = endpoint.idempotent(
  { who: ["volunteer", "organiser"], params: idPath("That drive"), resource: ownDrive, body: recyclingInputSchema, keepsPeople: true },
  async ({ actor, params, body, trx }) => recordRecycling(actor, params.id, body, trx),
);
