import type { Knex } from "knex";
import bcrypt from "bcryptjs";
import { createHash, randomBytes } from "node:crypto";
import { DEMO_GROUP, DEMO_PASSWORD, OTHER_GROUP } from "./data/scenario";

// Account extras of the demo: one person in both groups (to show switching
// the active group) and an open invitation on the organiser's members page.
// Invented people; the invitation's link is random and never shown.
export async function seed(knex: Knex): Promise<void> {
  const demo = await knex("groups").where({ slug: DEMO_GROUP.slug }).first();
  const other = await knex("groups").where({ slug: OTHER_GROUP.slug }).first();
  const organiser = await knex("users").where({ email: "organiser@cantrove.test" }).first();
  if (!demo || !other) return;

  const hash = await bcrypt.hash(DEMO_PASSWORD, 10);
  const [person] = await knex("users")
    .insert({ email: "two-groups@cantrove.test", name: "Juniper Hale", password_hash: hash, email_verified_at: knex.fn.now() })
    .returning("id");
  // The demo group first: it is where Juniper lands after signing in.
  await knex("memberships").insert({ group_id: demo.id, user_id: person.id, role: "volunteer", created_at: knex.raw("now() - interval '1 minute'") });
  await knex("memberships").insert({ group_id: other.id, user_id: person.id, role: "builder" });

  await knex("invitations").insert({
    group_id: demo.id,
    email: "newcomer@cantrove.test",
    role: "volunteer",
    token_hash: createHash("sha256").update(randomBytes(32)).digest("hex"),
    invited_by: organiser?.id ?? null,
    expires_at: knex.raw("now() + interval '7 days'"),
  });
}
