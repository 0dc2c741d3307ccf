import { endpoint } from "@/lib/api/endpoint";
import { listMembers } from "@/lib/accounts/queries";

export const dynamic = "force-dynamic";

export const GET = endpoint({ who: ["organiser"] }, async ({ actor }) => listMembers(actor.group.id));
