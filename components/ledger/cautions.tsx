import { Notice } from "@/components/ui/notice";

// The cautions that apply where the work happens. Common practice for handling
// used cans and hand tools; local rules and a workshop lead's word come first.
export function HaulCaution() {
  return (
    <Notice tone="caution" title="Sugary bins draw wasps">
      Look before you reach into a bin or bag, lift with your legs, and wear gloves: torn cans have sharp edges.
    </Notice>
  );
}

export function SortCaution() {
  return (
    <Notice tone="caution" title="Cut and torn edges are sharp">
      Wear cut-resistant gloves while sorting. Put crushed and torn cans straight into the reject bag, never back on the table.
    </Notice>
  );
}

export function ProcessingCaution({ to }: { to: string }) {
  if (to === "washed") {
    return (
      <Notice tone="caution" title="Washing">
        Gloves on: rims and dents cut. Rinse out sugar so the bins stop drawing wasps, and let cans dry before cutting.
      </Notice>
    );
  }
  return (
    <Notice tone="caution" title={to === "punched" ? "Punching: eye protection and gloves" : "Opening: gloves and eye protection"}>
      Cutting tops and punching bottoms leaves razor edges and can throw metal slivers. Wear safety glasses and cut-resistant gloves, work on
      a stable bench, keep fingers clear of the punch, and keep children away.
    </Notice>
  );
}
