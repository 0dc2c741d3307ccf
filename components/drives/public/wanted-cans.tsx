import { wantedExtra } from "@/lib/drives/wanted";

// What a drop point takes and what it does not. The can size is the common
// 12 US fl oz (355 mL) aluminium drink can the heater columns are planned around.
export const WANTED = ["Standard 355 mL aluminium drink cans", "Undented and not crushed", "Empty and rinsed out, ring pulls on"];
export const NOT_WANTED = ["Slim or tall cans (they do not fit the columns)", "Steel or tin food cans", "Crushed, dented or torn cans"];

export function WantedCans({ extra, compact = false }: { extra?: string; compact?: boolean }) {
  // Only what the organiser's note adds: the lists already say the rest.
  const note = extra ? wantedExtra(extra, [...WANTED, ...NOT_WANTED]) : "";
  return (
    <div className={`grid gap-4 ${compact ? "grid-cols-2" : "sm:grid-cols-2"}`}>
      <div>
        <h3 className="text-base font-bold text-moss-deep">Yes, please</h3>
        <ul className="mt-1 list-disc pl-5">
          {WANTED.map((w) => (
            <li key={w}>{w}</li>
          ))}
        </ul>
        {note ? <p className="mt-2 [overflow-wrap:anywhere]">{note}</p> : null}
      </div>
      <div>
        <h3 className="text-base font-bold text-alarm">No, thank you</h3>
        <ul className="mt-1 list-disc pl-5">
          {NOT_WANTED.map((w) => (
            <li key={w}>{w}</li>
          ))}
        </ul>
      </div>
    </div>
  );
}

export function CanSafetyNote() {
  return (
    <p className="text-sm text-ink-soft">
      Cut can edges are sharp: carry bags by the handles and never press cans down into a full bin with your hand.
      Rinsing keeps wasps away from the bins.
    </p>
  );
}
