import { z } from "zod";
import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { ownDrive } from "@/lib/drives/resource";
import { haulInputSchema } from "@/lib/ledger/schemas";
import { recordHaul } from "@/lib/ledger/record";
import { listHauls } from "@/lib/ledger/queries";

export const dynamic = "force-dynamic";

const haulsQuery = z.object({ open: z.string().optional() });

/** The drive's hauls, newest first; `?open=1` for those not yet sorted (what a sort can count). */
export const GET = endpoint(
  { who: ["volunteer", "organiser"], params: idPath("That drive"), query: haulsQuery },
  async ({ actor, params, query }) => listHauls(actor.group.id, params.id, { open: query.open === "1" }),
);

export const POST = endpoint.idempotent(
  { who: ["volunteer", "organiser"], params: idPath("That drive"), resource: ownDrive, body: haulInputSchema, keepsPeople: true },
  async ({ actor, params, body, trx }) => recordHaul(actor, params.id, body, trx),
);
