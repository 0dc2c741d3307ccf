import { compareGlazingOptions, type GlazingOption } from "@/lib/heaters/can-grid";
import { formatLength, formatNumber, formatPercent } from "@/lib/heaters/format";
import { resolveCanGridInput } from "@/lib/heaters/grid-input";

/** Side by side: which sheet gives more cans for the glass bought and less cut away. */
export function GlazingComparison({ options }: { options: GlazingOption[] }) {
  if (options.length < 2) {
    return <p className="text-ink-soft">Add a second sheet size above to compare them side by side.</p>;
  }
  const rows = compareGlazingOptions(options);
  const best = rows.find((r) => r.rank === 1);
  return (
    <div className="flex flex-col gap-3">
      {best ? (
        <p className="font-semibold" data-testid="comparison-verdict">
          {best.label} gives the most cans per square metre of glazing ({formatNumber(best.cansPerM2, 1)} cans/m²), with{" "}
          {formatPercent(best.coverage)} of the sheet behind cans.
        </p>
      ) : null}
      {/* Wider than a phone: focusable, so the table can be scrolled from the keyboard. */}
      <div className="relative overflow-x-auto" tabIndex={0} role="region" aria-label="Glazing options compared">
        <table className="w-full min-w-[44rem] border-collapse text-left">
          <caption className="sr-only">Glazing options compared</caption>
          <thead>
            <tr className="border-b-2 border-paper-edge">
              <th scope="col" className="py-2 pr-3">Sheet</th>
              <th scope="col" className="py-2 pr-3">Size</th>
              <th scope="col" className="py-2 pr-3">Covers</th>
              <th scope="col" className="py-2 pr-3">Manifolds</th>
              <th scope="col" className="py-2 pr-3">Grid</th>
              <th scope="col" className="py-2 pr-3">Cans</th>
              <th scope="col" className="py-2 pr-3">Cans per m²</th>
              <th scope="col" className="py-2 pr-3">Sheet behind cans</th>
              <th scope="col" className="py-2">Rank</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r, i) => {
              const u = options[i].input.unit;
              const plan = resolveCanGridInput(options[i].input);
              return (
                <tr key={i} className={`border-b border-paper-edge ${r.rank === 1 ? "bg-moss-soft" : ""}`}>
                  <th scope="row" className="py-2 pr-3">{r.label}</th>
                  <td className="py-2 pr-3">
                    {formatLength(options[i].input.glazingWidth, u)} × {formatLength(options[i].input.glazingHeight, u)}
                  </td>
                  <td className="py-2 pr-3" data-cell="covers">{plan.coverage === "full" ? "Chamber and manifolds" : "Chamber only"}</td>
                  <td className="py-2 pr-3" data-cell="manifolds">
                    {formatLength(plan.manifoldHeight, u)} each{plan.coverage === "full" ? ", inside the sheet" : ", outside"}
                  </td>
                  <td className="py-2 pr-3">{r.grid.columns} × {r.grid.rows}</td>
                  <td className="py-2 pr-3 font-bold">{formatNumber(r.grid.cans)}</td>
                  <td className="py-2 pr-3">{formatNumber(r.cansPerM2, 1)}</td>
                  <td className="py-2 pr-3">{formatPercent(r.coverage)}</td>
                  <td className="py-2">{r.rank === 1 ? "Best" : r.rank}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <p className="text-sm text-ink-faint">
        Ranked by cans per square metre of glazing, then by the share of the sheet behind cans (less slack to cut away or
        waste), then by the number of cans.
      </p>
    </div>
  );
}
