import Link from "next/link";
import { ButtonLink } from "@/components/ui/button-link";
import { Card, EmptyState } from "@/components/ui/card";
import { DatabaseDown } from "@/components/system/database-down";
import { isDatabaseUnreachable } from "@/lib/db";
import { groupByTiming, longDay, spanText } from "@/lib/drives/current-drive";
import { listPublicDrivesWithDay } from "@/lib/drives/public-queries";

const STEPS = [
  ["Gather", "Drop points at shops, schools and halls collect bags of empty cans from neighbours."],
  ["Count", "Volunteers haul the bags, sort good cans from dented, crushed and steel ones, and log it from a phone."],
  ["Prepare", "Good cans are washed, opened and punched in batches, with every step on one ledger."],
  ["Build", "Builders claim finished cans for each heater unit, sized from its glazing sheet."],
] as const;

type Listed = Awaited<ReturnType<typeof listPublicDrivesWithDay>>[number];

// Lists live drives: never prerendered at build time.
export const dynamic = "force-dynamic";

/** How many coming-up and ended drives the page lists before a "more" link (drives collecting now are all listed). */
const SHOWN = 5;

/** A capped list's link to the rest: the same page with that list in full (a plain link, no script). */
function MoreLink({ list, hidden, anchor }: { list: "upcoming" | "ended"; hidden: number; anchor: string }) {
  if (hidden <= 0) return null;
  return (
    <p className="mt-2">
      <Link href={`/?all=${list}#${anchor}`} className="tap">
        {hidden === 1 ? "1 more drive" : `${hidden} more drives`}
      </Link>
    </p>
  );
}

/** One drive per row; the whole row is the link, at least 44 px tall (WCAG 2.5.5). */
function DriveRows({ drives, note, hash = "" }: { drives: Listed[]; note: (d: Listed) => string; hash?: string }) {
  return (
    <ul className="divide-y divide-paper-edge">
      {drives.map((d) => (
        <li key={d.slug}>
          <Link
            href={`/drives/${d.slug}${hash}`}
            className="flex min-h-11 flex-wrap items-center justify-between gap-x-3 gap-y-1 py-2 no-underline hover:underline"
          >
            <span className="text-lg font-semibold [overflow-wrap:anywhere]">{d.name}</span>
            <span className="text-ink-faint">
              {d.groupName} · {note(d)}
            </span>
          </Link>
        </li>
      ))}
    </ul>
  );
}

export default async function LandingPage({ searchParams }: { searchParams: Promise<{ all?: string }> }) {
  const all = (await searchParams).all;
  let drives: Listed[];
  try {
    drives = await listPublicDrivesWithDay();
  } catch (error) {
    if (isDatabaseUnreachable(error)) return <DatabaseDown />;
    throw error;
  }
  const { running, upcoming, ended } = groupByTiming(drives);
  return (
    <main id="main" className="mx-auto max-w-5xl px-4 py-6 sm:py-10">
      {/* First on a phone: where a donor can take their cans. */}
      <section aria-labelledby="find-heading" className="rounded-card border-2 border-ember bg-white/70 p-4 sm:p-6">
        <h1 id="find-heading" className="text-3xl sm:text-4xl">
          Find a drop point near you
        </h1>
        <p className="mt-1 text-ink-soft">Choose a drive collecting now to see its drop points on a map, nearest to you first, and when each is open.</p>
        <h2 className="mt-4 text-xl">Collecting now</h2>
        {running.length === 0 ? (
          <EmptyState title="No drive is collecting today">
            {upcoming.length ? `The next one starts on ${longDay(upcoming[0].startsOn)}; see “Coming up” below.` : "Groups publish their drives here once they open drop points."}
          </EmptyState>
        ) : (
          <DriveRows drives={running} hash="#list-heading" note={(d) => `until ${longDay(d.endsOn)}`} />
        )}
      </section>

      <section className="mt-10 grid gap-6 sm:grid-cols-[3fr_2fr] sm:items-center">
        <div>
          <p className="font-semibold uppercase tracking-wide text-ember-deep">Cantrove</p>
          <h2 className="mt-2 text-3xl sm:text-4xl">Empty cans in, warm rooms out.</h2>
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

      {upcoming.length ? (
        <div id="coming-up">
          <Card title="Coming up" className="mt-10">
            <DriveRows drives={all === "upcoming" ? upcoming : upcoming.slice(0, SHOWN)} note={(d) => `starts ${longDay(d.startsOn)}`} />
            <MoreLink list="upcoming" anchor="coming-up" hidden={all === "upcoming" ? 0 : upcoming.length - SHOWN} />
          </Card>
        </div>
      ) : null}
      {ended.length ? (
        <div id="ended">
          <Card title="Ended" className="mt-6">
            <DriveRows drives={all === "ended" ? ended : ended.slice(0, SHOWN)} note={(d) => spanText(d)} />
            <MoreLink list="ended" anchor="ended" hidden={all === "ended" ? 0 : ended.length - SHOWN} />
          </Card>
        </div>
      ) : null}
    </main>
  );
}
