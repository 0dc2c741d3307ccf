"use server";

// The donor's cancel form (app/(public)/pledges/cancel/[token]): the same
// schema, limit and function as POST /api/public/pledges/cancel.
import { action } from "@/lib/api/action";
import type { ActionState } from "@/lib/api/action-state";
import { FILL_REPORT_LIMITS } from "./limits";
import { cancelPledgeByToken } from "./pledge-life";
import { pledgeCancelInput } from "./schemas";

// action() clears every server's read cache after the work, as endpoint() does.
const cancelRun = action({ who: "anyone", schema: pledgeCancelInput, limits: FILL_REPORT_LIMITS, secret: ["token"] }, async ({ input }) => cancelPledgeByToken(input.token));
export async function cancelPledgeAction(previous: ActionState<{ id: string; status: string }>, formData: FormData) {
  return cancelRun(previous, formData);
}
