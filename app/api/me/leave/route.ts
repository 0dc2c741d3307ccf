import { endpoint } from "@/lib/api/endpoint";
import { leaveGroup } from "@/lib/accounts/leaving";
import { leaveGroupInputSchema } from "@/lib/accounts/schemas";

export const dynamic = "force-dynamic";

// The signed-in person leaves their active group (409 for its only organiser). Their sessions end.
export const POST = endpoint({ who: "member", body: leaveGroupInputSchema }, async ({ actor }) => leaveGroup(actor.group.id, actor.user.id));
