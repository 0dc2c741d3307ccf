import Link from "next/link";
import { getActor } from "@/lib/auth/session";
import { ROLE_HOME, ROLE_LABEL } from "@/lib/auth/roles";

export default async function ForbiddenPage() {
  const actor = await getActor();
  return (
    <main id="main" className="mx-auto max-w-xl px-4 py-16">
      <h1 className="text-3xl">Not open to your role</h1>
      <p className="mt-2 text-ink-soft">
        {actor
          ? `You are signed in as ${ROLE_LABEL[actor.role].toLowerCase()} of ${actor.group.name}; that page is for another role. Ask an organiser if you need it.`
          : "Sign in with an account that has access to that page."}
      </p>
      <p className="mt-4">
        <Link href={actor ? ROLE_HOME[actor.role] : "/signin"}>{actor ? "Go to your home" : "Sign in"}</Link>
      </p>
    </main>
  );
}
