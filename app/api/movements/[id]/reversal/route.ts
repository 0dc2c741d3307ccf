import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { reverseMovement } from "@/lib/ledger/record";
import { reversalInputSchema } from "@/lib/ledger/schemas";

export const dynamic = "force-dynamic";

// Any signed-in member may ask; reverseMovement finds the movement by id *and*
// group (another group's is 404) and allows its author or an organiser.
// The body is optional ({reason}); an empty body still undoes.
export const POST = endpoint.idempotent(
  { who: "member", params: idPath("That entry"), body: reversalInputSchema, keepsPeople: true },
  async ({ actor, params, body, trx }) => reverseMovement(actor, params.id, trx, body.reason || undefined),
);
