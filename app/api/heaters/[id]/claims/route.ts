import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { unitFor } from "@/lib/heaters/resource";
import { claimInputSchema } from "@/lib/ledger/schemas";
import { recordClaim } from "@/lib/ledger/record";

export const dynamic = "force-dynamic";

export const POST = endpoint.idempotent(
  { who: ["builder", "organiser"], params: idPath("That heater unit"), resource: unitFor("claim"), body: claimInputSchema, keepsPeople: true },
  async ({ actor, params, body, trx }) => recordClaim(actor, params.id, body.quantity, trx, body.note),
);
