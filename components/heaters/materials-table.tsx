import { DEFAULT_BEAD_DIAMETER_MM, type MaterialKey, type MaterialsList, type TradeMeasure } from "@/lib/heaters/materials";
import { MM_PER_INCH, NBSP } from "@/lib/format";
import { formatLength, formatNumber, formatRunLength } from "@/lib/heaters/format";

export const MATERIAL_LABEL: Record<MaterialKey, string> = {
  glazing: "Glazing sheet",
  absorberPaint: "High-temperature black paint (area to cover)",
  adhesive: "High-temperature adhesive for can joints",
  frameLumber: "Frame lumber (one run round the box)",
  insulation: "Rigid insulation board",
  fan: "Fan",
  thermostatSwitch: "Over-temperature / thermostat switch",
  backdraftDamper: "Backdraft damper",
};

export const MEASURE_LABEL: Record<TradeMeasure, string> = {
  m2: "m²",
  ft2: "ft²",
  m: "m",
  ft: "ft",
  cartridge: "cartridges",
  each: "each",
};

/** The materials of one unit; used by the planner and the printed build sheet. */
export function MaterialsTable({ list, priceCell }: { list: MaterialsList; priceCell?: (key: MaterialKey) => React.ReactNode }) {
  return (
    <div className="flex flex-col gap-2">
      <div className="relative overflow-x-auto">
        <table className="w-full border-collapse text-left">
          <caption className="sr-only">Materials</caption>
          <thead>
            <tr className="border-b-2 border-paper-edge">
              <th scope="col" className="py-2 pr-3">Item</th>
              <th scope="col" className="py-2 pr-3">Quantity</th>
              {priceCell ? <th scope="col" className="py-2 pr-3">Unit price</th> : null}
              <th scope="col" className="py-2">Cost</th>
            </tr>
          </thead>
          <tbody>
            {list.lines.map((line) => (
              <tr key={line.key} className="border-b border-paper-edge">
                <th scope="row" className="py-2 pr-3 font-normal">{MATERIAL_LABEL[line.key]}</th>
                <td className="py-2 pr-3" data-material={line.key}>
                  {formatNumber(line.quantity, line.measure === "each" || line.measure === "cartridge" ? 0 : 2)} {MEASURE_LABEL[line.measure]}
                </td>
                {priceCell ? <td className="py-2 pr-3">{priceCell(line.key)}</td> : null}
                <td className="py-2">{line.cost === undefined ? "—" : formatNumber(line.cost, 2)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="text-sm text-ink-soft">
        Adhesive: {list.adhesive.joints} joints, a bead of {formatRunLength(list.adhesive.beadLength, list.unit)} in all; one cartridge lays about{" "}
        {formatRunLength(list.adhesive.beadLengthPerCartridge, list.unit)} of a{" "}
        {formatLength(list.unit === "mm" ? DEFAULT_BEAD_DIAMETER_MM : DEFAULT_BEAD_DIAMETER_MM / MM_PER_INCH, list.unit)} bead (10{NBSP}% extra allowed for starts and squeeze-out).
      </p>
      {list.cost ? (
        <p className="font-bold" data-testid="materials-cost">
          Cost estimate: {formatNumber(list.cost.total, 2)}
          {list.cost.complete ? "" : " (only the priced lines)"}
        </p>
      ) : null}
    </div>
  );
}
