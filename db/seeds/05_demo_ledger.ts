import type { Knex } from "knex";
import type { Actor } from "../../lib/auth/queries";
import { recordHaul, recordProcessing, recordSort } from "../../lib/ledger/write";
import { recordBuiltIn, recordClaim } from "../../lib/ledger/write-claims";

// A little ledger history so the demo shows numbers: the harvest drive ran its
// course (its test panel built in), the winter drive is under way. Written
// through the same writers the app uses, so every running total is exact.
const DAY = 86_400_000;

export async function seed(knex: Knex): Promise<void> {
  const group = await knex("groups").where({ slug: "larkhollow-warm-rooms" }).first();
  if (!group) return;
  const person = async (email: string, role: Actor["role"]): Promise<Actor> => {
    const u = await knex("users").where({ email }).first();
    if (!u) throw new Error(`The demo seed needs ${email}: run the seeds in order.`);
    return { user: { id: u.id, email: u.email, name: u.name }, group: { id: group.id, slug: group.slug, name: group.name }, role };
  };
  const volunteer = await person("volunteer@cantrove.test", "volunteer");
  const organiser = await person("organiser@cantrove.test", "organiser");
  const builder = await person("builder@cantrove.test", "builder");
  // Seeded by the earlier demo seeds, so each is there.
  const drive = async (slug: string) => (await knex("drives").where({ slug, group_id: group.id }).first())!.id;
  const point = async (name: string) => (await knex("drop_points").where({ name, group_id: group.id }).first())!.id;
  const unit = async (name: string) => (await knex("heater_units").where({ name, group_id: group.id }).first())!.id;

  await knex.transaction(async (trx) => {
    // Harvest fair drive (ended): two weighed hauls, sorted, processed, built into the test panel.
    const harvest = await drive("larkhollow-harvest-2026");
    const stall = await point("Harvest Fair stall");
    const fairDay = new Date("2026-09-20T15:00:00Z");
    const h1 = await recordHaul(volunteer, harvest, { dropPointId: stall, bags: 2, weightKg: 3.4, hauledAt: fairDay.toISOString() }, trx);
    const h2 = await recordHaul(organiser, harvest, { dropPointId: stall, bags: 1, weightKg: 1.9, hauledAt: new Date(fairDay.getTime() + DAY).toISOString() }, trx);
    const at = (days: number) => new Date(fairDay.getTime() + days * DAY).toISOString();
    await recordSort(volunteer, harvest, { haulIds: [h1.id, h2.id], good: 322, rejected: { dented: 41, crushed: 22, wrongSize: 17, notAluminium: 3 }, sortedAt: at(3) }, trx);
    await recordProcessing(volunteer, harvest, { from: "good", to: "washed", quantity: 300, occurredAt: at(4) }, trx);
    await recordProcessing(volunteer, harvest, { from: "washed", to: "opened", quantity: 280, occurredAt: at(6) }, trx);
    await recordProcessing(volunteer, harvest, { from: "opened", to: "punched", quantity: 120, occurredAt: at(8) }, trx);
    const panel = await unit("Harvest workshop test panel");
    // The panel is installed now; replay its build as it happened, then put its state back.
    await trx("heater_units").where({ id: panel }).update({ state: "planned" });
    await recordClaim(builder, panel, 81, trx);
    await recordBuiltIn(builder, panel, 81, trx);
    await trx("heater_units").where({ id: panel }).update({ state: "installed" });

    // Winter drive (running): hauls over the last days, one sort, some processing, a claim.
    const winter = await drive("larkhollow-winter-2026");
    const now = Date.now();
    const ago = (days: number, hour = 10) => new Date(Math.floor((now - days * DAY) / DAY) * DAY + hour * 3_600_000).toISOString();
    const library = await point("Larkhollow Library porch");
    const shop = await point("Hilltop Corner Shop");
    const school = await point("Millbrook School gate");
    const a = await recordHaul(volunteer, winter, { dropPointId: library, bags: 3, weightKg: 5.2, hauledAt: ago(9) }, trx);
    const b = await recordHaul(volunteer, winter, { dropPointId: shop, bags: 2, hauledAt: ago(8, 17) }, trx);
    const c = await recordHaul(volunteer, winter, { dropPointId: school, bags: 4, weightKg: 6.8, hauledAt: ago(6) }, trx);
    await recordSort(volunteer, winter, { haulIds: [a.id], good: 334, rejected: { dented: 28, crushed: 19, notAluminium: 2 }, sortedAt: ago(8, 19) }, trx);
    await recordSort(volunteer, winter, { haulIds: [b.id], good: 97, rejected: { wrongSize: 8, damaged: 5 }, sortedAt: ago(7, 18) }, trx);
    await recordSort(organiser, winter, { haulIds: [c.id], good: 421, rejected: { dented: 36, crushed: 22, other: 4 }, sortedAt: ago(4, 18) }, trx);
    await recordHaul(volunteer, winter, { dropPointId: library, bags: 2, hauledAt: ago(2) }, trx);
    await recordHaul(volunteer, winter, { dropPointId: shop, bags: 1, weightKg: 1.6, hauledAt: ago(1) }, trx);
    await recordProcessing(volunteer, winter, { from: "good", to: "washed", quantity: 400, occurredAt: ago(6, 14) }, trx);
    await recordProcessing(volunteer, winter, { from: "washed", to: "opened", quantity: 260, occurredAt: ago(3, 14) }, trx);
    await recordProcessing(volunteer, winter, { from: "opened", to: "punched", quantity: 132, occurredAt: ago(2, 15) }, trx);
    await recordClaim(builder, await unit("Library reading room"), 132, trx);

    // In the story each entry was sent as it happened; the writers stamp the
    // seeding moment, which would show every line as "sent" today. The
    // append-only trigger is set aside for this one correction, in this
    // transaction only.
    await trx.raw("alter table ledger_lines disable trigger ledger_lines_no_update");
    await trx.raw("update ledger_lines set recorded_at = occurred_at where group_id = ?", [group.id]);
    await trx.raw("alter table ledger_lines enable always trigger ledger_lines_no_update");
    await trx.raw("update movements set recorded_at = occurred_at where group_id = ?", [group.id]);
  });
}
