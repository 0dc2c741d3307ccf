import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { changeGlazing } from "@/lib/heaters/glazing";
import { ownHeaterUnit } from "@/lib/heaters/resource";
import { heaterGlazingInputSchema } from "@/lib/heaters/unit-schemas";

export const dynamic = "force-dynamic";

// A unit's new glazing (issue 16): organisers only; another group's unit is 404
// before the body is read; 409 below what is claimed and built in, or once installed.
export const POST = endpoint(
  { who: ["organiser"], params: idPath("That heater unit"), resource: ownHeaterUnit, body: heaterGlazingInputSchema },
  async ({ actor, resource, body }) => changeGlazing(actor, resource, body.plan),
);
