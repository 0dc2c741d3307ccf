import { endpoint } from "@/lib/api/endpoint";
import { slugPath } from "@/lib/api/path";
import { createPledge } from "@/lib/drives/public-actions";
import { PLEDGE_LIMITS } from "@/lib/drives/limits";
import { pledgeInput } from "@/lib/drives/schemas";

export const dynamic = "force-dynamic";

// Anyone may pledge; name and e-mail are optional and never shown publicly.
export const POST = endpoint(
  {
    who: "anyone",
    params: slugPath(),
    body: pledgeInput,
    status: 201,
    limits: PLEDGE_LIMITS,
  },
  async ({ params, body }) => createPledge(params.slug, body),
);
