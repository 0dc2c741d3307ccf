import { z } from "zod";
import { endpoint } from "@/lib/api/endpoint";
import { stopPath } from "@/lib/runs/paths";
import { logHaulAtStop } from "@/lib/runs/commands";
import { visibleRun } from "@/lib/runs/resource";

export const dynamic = "force-dynamic";

const bodySchema = z.record(z.string(), z.unknown(), { error: "Send the haul as a JSON object" });

// Logs the haul at this stop and settles the stop in one database call
// (logHaulAtStop: the ledger's own writer, same rules and estimate as
// POST /api/drives/{id}/hauls; the stop keeps the haul's id). An
// Idempotency-Key makes a retry from a flaky phone connection harmless.
export const POST = endpoint.idempotent(
  { who: ["organiser", "volunteer"], params: stopPath, resource: visibleRun, body: bodySchema, keepsPeople: true },
  async ({ actor, params, resource: before, body, trx }) => logHaulAtStop(actor, before, params.stopId, body, trx),
);
