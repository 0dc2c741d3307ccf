import { z } from "zod";
import { endpoint } from "@/lib/api/endpoint";
import { uuidSegment } from "@/lib/api/path";
import { handOver } from "@/lib/accounts/leaving";
import { groupMember } from "@/lib/accounts/resource";
import { handOverInputSchema } from "@/lib/accounts/schemas";

export const dynamic = "force-dynamic";

const memberPath = z.object({ userId: uuidSegment("That member") });

// The member taking over is resolved in the acting group first: another group's person is 404.
export const POST = endpoint(
  { who: ["organiser"], params: memberPath, resource: groupMember, body: handOverInputSchema },
  async ({ actor, params, body }) => handOver(actor.group.id, actor.user.id, params.userId, body),
);
