import { endpoint } from "@/lib/api/endpoint";

export const dynamic = "force-dynamic";

export const GET = endpoint({ who: "member" }, async ({ actor: { user, group, role } }) => ({ user, group, role }));
