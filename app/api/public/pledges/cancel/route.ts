import { endpoint } from "@/lib/api/endpoint";
import { FILL_REPORT_LIMITS } from "@/lib/drives/limits";
import { cancelPledgeByToken } from "@/lib/drives/pledge-life";
import { pledgeCancelInput } from "@/lib/drives/schemas";

export const dynamic = "force-dynamic";

// The donor cancels a pledge with the token from the confirmation mail (no
// account). 404 when the token names no pledge, 409 once it is cancelled or marked.
export const POST = endpoint({ who: "anyone", body: pledgeCancelInput, limits: FILL_REPORT_LIMITS }, async ({ body }) => cancelPledgeByToken(body.token));
