import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { unitFor } from "@/lib/heaters/resource";
import { claimInputSchema } from "@/lib/ledger/schemas";
import { releaseClaim } from "@/lib/ledger/record";

export const dynamic = "force-dynamic";

export const POST = endpoint.idempotent(
  { who: ["builder", "organiser"], params: idPath("That heater unit"), resource: unitFor("release"), body: claimInputSchema, keepsPeople: true },
  async ({ actor, params, body, trx }) => releaseClaim(actor, params.id, body.quantity, trx, body.note),
);
