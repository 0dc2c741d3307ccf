import { describe, expect, it } from "vitest";
import { evaluate, INITIAL_OPTIONS, INITIAL_SETTINGS, toCanGridInput } from "@/components/heaters/plan-form-state";
import { INITIAL_HEAT } from "@/components/heaters/heat-panel";
import { computeCanGrid } from "@/lib/heaters/can-grid";
import { canGridInputSchema, heatOutputInputSchema } from "@/lib/heaters/schemas";

// The planner draws its first screen before zod has loaded (hooks/use-lazy-schemas):
// it shows results only for the sheets and heat figures it opens with, so those
// must be ones the schemas accept, and anything else must wait for the schemas.
describe("planner before its schemas load", () => {
  it("opens only with sheets the can-grid schema accepts, and shows the grid the schema's path would", () => {
    for (const option of INITIAL_OPTIONS) {
      const input = toCanGridInput(INITIAL_SETTINGS, option);
      expect(canGridInputSchema.safeParse(input).success, option.label).toBe(true);
      const early = evaluate(INITIAL_SETTINGS, option, null);
      const checked = evaluate(INITIAL_SETTINGS, option, canGridInputSchema);
      expect(early.ok && checked.ok).toBe(true);
      if (early.ok && checked.ok) expect(early.grid).toEqual(checked.grid);
      expect(early.ok && early.grid).toEqual(computeCanGrid(input));
    }
  });

  it("opens with heat figures the heat-output schema accepts (with any aperture the schema allows)", () => {
    const numbers = Object.fromEntries(Object.entries(INITIAL_HEAT).map(([k, v]) => [k, Number(v)]));
    for (const apertureAreaM2 of [0.01, 1, 100]) expect(heatOutputInputSchema.safeParse({ ...numbers, apertureAreaM2 }).success).toBe(true);
  });

  it("makes anything typed wait for the schema: no grid for an edited sheet, nor for a bad one", () => {
    const edited = evaluate(INITIAL_SETTINGS, { ...INITIAL_OPTIONS[0]!, width: "31" }, null);
    expect(edited).toMatchObject({ ok: false, pending: true });
    const bad = evaluate(INITIAL_SETTINGS, { ...INITIAL_OPTIONS[0]!, width: "-3" }, null);
    expect(bad).toMatchObject({ ok: false, pending: true });
    // Once loaded, the schema speaks: the same bad width gets its message.
    const checked = evaluate(INITIAL_SETTINGS, { ...INITIAL_OPTIONS[0]!, width: "-3" }, canGridInputSchema);
    expect(checked.ok).toBe(false);
    expect(!checked.ok && checked.errors.glazingWidth).toBe("Glazing width must be greater than 0");
    const mm = evaluate({ ...INITIAL_SETTINGS, unit: "mm" }, INITIAL_OPTIONS[0]!, null);
    expect(mm).toMatchObject({ ok: false, pending: true });
  });
});
