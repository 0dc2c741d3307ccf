import { after } from "next/server";
import { endpoint } from "@/lib/api/endpoint";
import { RESET_REQUEST_LIMITS } from "@/lib/accounts/limits";
import { RESET_ANSWER, resetRequestInputSchema } from "@/lib/accounts/schemas";
import { requestPasswordReset } from "@/lib/accounts/resets";

export const dynamic = "force-dynamic";

// The same answer, at the same speed, whether or not the address has an
// account: the lookup and the e-mail happen after the response has gone.
export const POST = endpoint(
  {
    who: "anyone",
    body: resetRequestInputSchema,
    status: 202,
    limits: RESET_REQUEST_LIMITS,
  },
  async ({ body }) => {
    after(() => requestPasswordReset(body.email).catch((error) => console.error("[cantrove] reset mail failed", error)));
    return { message: RESET_ANSWER };
  },
);
