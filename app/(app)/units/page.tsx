import type { Metadata } from "next";
import { Card, EmptyState } from "@/components/ui/card";
import { ButtonLink } from "@/components/ui/button";
import { requirePageRole } from "@/lib/auth/session";
import { listHeaterUnitsSummary } from "@/lib/heaters/queries";

export const metadata: Metadata = { title: "My heater units" };

export default async function UnitsPage() {
  const actor = await requirePageRole("/units", "builder", "organiser");
  const units = await listHeaterUnitsSummary(actor.group.id);
  return (
    <main className="flex flex-col gap-6">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-3xl">Heater units</h1>
        <ButtonLink href="/plan">Plan a unit</ButtonLink>
      </div>
      <Card>
        {units.length === 0 ? (
          <EmptyState title="No heater units yet">Plan one from its glazing sheet to see how many cans it needs.</EmptyState>
        ) : (
          <ul className="divide-y divide-paper-edge">
            {units.map((u) => (
              <li key={u.id} className="flex flex-wrap justify-between gap-2 py-3">
                <span className="font-semibold">{u.name}</span>
                <span className="text-ink-faint">
                  {u.columns} × {u.rows} = {u.cans} cans · {u.state}
                </span>
              </li>
            ))}
          </ul>
        )}
      </Card>
    </main>
  );
}
