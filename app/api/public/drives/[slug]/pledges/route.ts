import { endpoint } from "@/lib/api/endpoint";
import { slugPath } from "@/lib/api/path";
import { createPledge } from "@/lib/drives/public-actions";
import { PUBLIC_LIMITS } from "@/lib/drives/limits";
import { pledgeInput } from "@/lib/drives/schemas";

export const dynamic = "force-dynamic";

// Anyone may pledge; name and e-mail are optional and never shown publicly.
export const POST = endpoint(
  {
    who: "anyone",
    params: slugPath(),
    body: pledgeInput,
    status: 201,
    limits: [
      { rule: PUBLIC_LIMITS.pledgePerClient, by: "client" },
      { rule: PUBLIC_LIMITS.pledgePerAddress, by: ({ body }) => body.email },
    ],
  },
  async ({ params, body }) => createPledge(params.slug, body),
);
