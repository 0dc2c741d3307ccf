import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { moveClaims } from "@/lib/heaters/move-claims";
import { ownHeaterUnit } from "@/lib/heaters/resource";
import { claimMoveInputSchema } from "@/lib/heaters/unit-schemas";

export const dynamic = "force-dynamic";

// Organisers move claimed cans between units of a drive (a release and a claim).
export const POST = endpoint.idempotent(
  { who: ["organiser"], params: idPath("That heater unit"), resource: ownHeaterUnit, body: claimMoveInputSchema, keepsPeople: true },
  async ({ actor, params, body, trx }) => moveClaims(actor, params.id, body.toHeaterId, body.quantity, trx),
);
