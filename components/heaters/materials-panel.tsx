"use client";

import { useState } from "react";
import { computeMaterials, type MaterialKey, type TradeMeasure } from "@/lib/heaters/materials";
import type { CanGridInput } from "@/lib/heaters/grid-input";
import { MaterialsTable, MATERIAL_LABEL, MEASURE_LABEL } from "./materials-table";

/** The materials with optional unit prices typed in; prices stay in the browser. */
export function MaterialsPanel({ input }: { input: CanGridInput }) {
  const [prices, setPrices] = useState<Partial<Record<MaterialKey, string>>>({});
  const numeric: Partial<Record<MaterialKey, number>> = {};
  for (const [key, text] of Object.entries(prices) as Array<[MaterialKey, string]>) {
    const n = Number(text.replace(",", "."));
    if (text.trim() !== "" && Number.isFinite(n) && n >= 0) numeric[key] = n;
  }
  const list = computeMaterials(input, { prices: numeric });
  const measures = Object.fromEntries(list.lines.map((l) => [l.key, l.measure])) as Record<MaterialKey, TradeMeasure>;
  return (
    <MaterialsTable
      list={list}
      priceCell={(key) => {
        const text = prices[key] ?? "";
        const bad = text.trim() !== "" && numeric[key] === undefined;
        return (
          <span className="flex flex-col">
            <input
              aria-label={`Price per ${MEASURE_LABEL[measures[key]]} of ${MATERIAL_LABEL[key].toLowerCase()}`}
              inputMode="decimal"
              value={text}
              placeholder="optional"
              aria-invalid={bad || undefined}
              onChange={(e) => setPrices({ ...prices, [key]: e.target.value })}
              className={`min-h-11 w-28 rounded-lg border-2 bg-white px-2 ${bad ? "border-alarm" : "border-ink/40"}`}
            />
            {bad ? <span className="text-sm font-semibold text-alarm">Type a price of 0 or more</span> : null}
          </span>
        );
      }}
    />
  );
}
