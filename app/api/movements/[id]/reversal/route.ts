import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { reverseMovement } from "@/lib/ledger/record";

export const dynamic = "force-dynamic";

// Any signed-in member may ask; reverseMovement finds the movement by id *and*
// group (another group's is 404) and allows its author or an organiser.
export const POST = endpoint.idempotent(
  { who: "member", params: idPath("That entry"), keepsPeople: true },
  async ({ actor, params, trx }) => reverseMovement(actor, params.id, trx),
);
