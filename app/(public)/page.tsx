import Link from "next/link";
import { ButtonLink } from "@/components/ui/button-link";
import { Card, EmptyState } from "@/components/ui/card";
import { DatabaseDown } from "@/components/system/database-down";
import { isDatabaseUnreachable } from "@/lib/db";
import { listPublicDrives } from "@/lib/drives/public-queries";

const STEPS = [
  ["Gather", "Drop points at shops, schools and halls collect bags of empty cans from neighbours."],
  ["Count", "Volunteers haul the bags, sort good cans from dented, crushed and steel ones, and log it from a phone."],
  ["Prepare", "Good cans are washed, opened and punched in batches, with every step on one ledger."],
  ["Build", "Builders claim finished cans for each heater unit, sized from its glazing sheet."],
] as const;

function formatRange(start: string, end: string) {
  const fmt = (d: string) => new Date(`${d}T12:00:00Z`).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" });
  return `${fmt(start)} – ${fmt(end)}`;
}

// Lists live drives: never prerendered at build time.
export const dynamic = "force-dynamic";

export default async function LandingPage() {
  let drives: Awaited<ReturnType<typeof listPublicDrives>>;
  try {
    drives = await listPublicDrives();
  } catch (error) {
    if (isDatabaseUnreachable(error)) return <DatabaseDown />;
    throw error;
  }
  return (
    <main id="main" className="mx-auto max-w-5xl px-4 py-8 sm:py-12">
      <section className="grid gap-6 sm:grid-cols-[3fr_2fr] sm:items-center">
        <div>
          <p className="font-semibold uppercase tracking-wide text-ember-deep">Cantrove</p>
          <h1 className="mt-2 text-4xl sm:text-5xl">Empty cans in, warm rooms out.</h1>
          <p className="mt-4 text-lg text-ink-soft">
            Cantrove runs the can drives behind community-built solar air heaters: where the drop points are, how
            many good cans have come in, who is washing and punching them, and how many heaters they will fill.
          </p>
          <div className="mt-6 flex flex-wrap gap-3">
            <ButtonLink href="/plan">Plan a heater</ButtonLink>
            <ButtonLink href="/signin" variant="secondary">
              Sign in to your group
            </ButtonLink>
          </div>
        </div>
        <ol className="grid gap-3" aria-label="How a drive works">
          {STEPS.map(([title, text], i) => (
            <li key={title} className="flex gap-3 rounded-card bg-paper-deep p-3">
              <span className="flex h-8 w-8 shrink-0 items-center justify-center rounded-full bg-ink font-bold text-paper">
                {i + 1}
              </span>
              <span>
                <strong>{title}.</strong> {text}
              </span>
            </li>
          ))}
        </ol>
      </section>

      <Card title="Drives collecting now" className="mt-10">
        {drives.length === 0 ? (
          <EmptyState title="No public drives yet">Groups publish their drives here once they open drop points.</EmptyState>
        ) : (
          <ul className="divide-y divide-paper-edge">
            {drives.map((d) => (
              <li key={d.slug} className="flex flex-wrap items-baseline justify-between gap-2 py-3">
                <Link href={`/drives/${d.slug}`} className="tap text-lg font-semibold">
                  {d.name}
                </Link>
                <span className="text-ink-faint">{formatRange(d.startsOn, d.endsOn)}</span>
              </li>
            ))}
          </ul>
        )}
      </Card>
    </main>
  );
}
