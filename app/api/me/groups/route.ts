import { endpoint } from "@/lib/api/endpoint";
import { listMemberships } from "@/lib/auth/queries";
import type { MyGroup } from "@/lib/accounts/types";

export const dynamic = "force-dynamic";

// The groups the signed-in person belongs to, for the group switcher.
export const GET = endpoint({ who: "member" }, async ({ actor }): Promise<MyGroup[]> => {
  const groups = await listMemberships(actor.user.id);
  return groups.map((g) => ({ ...g, active: g.id === actor.group.id }));
});
