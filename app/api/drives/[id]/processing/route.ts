import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { ownDrive } from "@/lib/drives/resource";
import { processingInputSchema } from "@/lib/ledger/schemas";
import { ledgerRefusal, prepareProcessing } from "@/lib/ledger/record";

export const dynamic = "force-dynamic";

// One statement writes the key, its answer and the ledger lines (see withIdempotentStatement);
// ledger_post refuses another group's drive (404), so the hot path resolves the drive there.
export const POST = endpoint.statement(
  {
    who: ["volunteer", "organiser"],
    params: idPath("That drive"),
    checkOnRefusal: ownDrive,
    body: processingInputSchema,
    keepsPeople: true,
  },
  async ({ actor, params, body }) => {
    const { answer, call } = await prepareProcessing(actor, params.id, body);
    return { body: answer, ...call, refusal: ledgerRefusal };
  },
);
