import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { moveHeaterState } from "@/lib/heaters/queries";
import { ownHeaterUnit } from "@/lib/heaters/resource";
import { checkStateMove } from "@/lib/heaters/states";
import { heaterStateInputSchema } from "@/lib/heaters/unit-schemas";

export const dynamic = "force-dynamic";

// Moves a unit along planned → claiming → building → installed; the rule is
// in lib/heaters/states.ts and is checked under a row lock.
export const POST = endpoint(
  { who: ["builder", "organiser"], params: idPath("That heater unit"), resource: ownHeaterUnit, body: heaterStateInputSchema },
  async ({ actor, params, body }) =>
    moveHeaterState(actor.group.id, params.id, body.state, (from) => checkStateMove(from, body.state, actor.role)),
);
