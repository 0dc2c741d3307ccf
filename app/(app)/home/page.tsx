import { redirect } from "next/navigation";
import { requirePageRole } from "@/lib/auth/session";
import { ROLE_HOME } from "@/lib/auth/roles";

export const dynamic = "force-dynamic";

// Where "home" means the signed-in person's own landing for their role in the active group.
export default async function HomeRedirect() {
  const actor = await requirePageRole("/home");
  redirect(ROLE_HOME[actor.role]);
}
