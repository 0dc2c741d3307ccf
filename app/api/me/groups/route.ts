import { endpoint } from "@/lib/api/endpoint";
import { listMemberships } from "@/lib/auth/queries";

export const dynamic = "force-dynamic";

// The groups the signed-in person belongs to, for the group switcher.
export const GET = endpoint({ who: "member" }, async ({ actor }) => {
  const groups = await listMemberships(actor.user.id);
  return groups.map((g) => ({ ...g, active: g.id === actor.group.id }));
});
