import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { moveUnitState } from "@/lib/heaters/move-state";
import { unitFor } from "@/lib/heaters/resource";
import { heaterStateInputSchema } from "@/lib/heaters/unit-schemas";

export const dynamic = "force-dynamic";

// Moves a unit along planned → claiming → building → installed; the rule is
// in lib/heaters/states.ts, and the database re-checks the state it was checked
// against under the unit's lock (lib/heaters/move-state.ts). Installing gives
// the unit's unbuilt claims back to the drive (`released` in the answer).
// Another group's unit is 404, another builder's 403, before anything about the body is said.
export const POST = endpoint(
  { who: ["builder", "organiser"], params: idPath("That heater unit"), resource: unitFor("state"), body: heaterStateInputSchema },
  async ({ actor, params, body }) => moveUnitState(actor, params.id, body.state),
);
