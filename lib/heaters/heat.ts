/**
 * Heat estimate of one heater (PRODUCT.md computation 5). Pure and in SI
 * except where a US form is asked for by name. Every figure is an estimate:
 * the collector coefficients are the builder's, the sky is assumed steady.
 */
import type { HeatOutputInput } from "./schemas";

/** Air near room conditions (≈ 20 °C, sea level), as the contract fixes. */
export const AIR_DENSITY_KG_M3 = 1.2;
export const AIR_CP_J_KG_K = 1005;
/** 1 W in IT Btu per hour. */
export const BTUH_PER_W = 3.412141633;
/**
 * US sensible-heat factor: 0.075 lb/ft³ × 60 min/h × 0.24 Btu/(lb·°F) = 1.08,
 * so BTU/h = 1.08 × CFM × ΔT°F for standard air.
 */
export const SENSIBLE_HEAT_FACTOR_US = 1.08;

export interface HeatOutput {
  /** Collector efficiency, 0–1 (η0 − a1·ΔT/G, floored at 0). */
  efficiency: number;
  usefulW: number;
  usefulBtuh: number;
  airRiseC: number;
  outletC: number;
}

/**
 * Linear (Hottel–Whillier–Bliss) efficiency referred to the inlet: η0 is
 * FR(τα), a1 is FR·UL. Floored at 0 because a collector colder than its
 * losses simply delivers nothing — it does not pull heat out of the room air
 * in this model. G ≤ 0 (no sun) also gives 0 instead of dividing by zero.
 */
export function collectorEfficiency(eta0: number, a1: number, deltaTK: number, irradianceWm2: number): number {
  if (!(irradianceWm2 > 0)) return 0;
  return Math.max(0, eta0 - (a1 * deltaTK) / irradianceWm2);
}

/** Temperature rise (K) of an airflow (m³/h) carrying `watts`: Q = ρ·cp·V̇·ΔT. */
export function airTemperatureRiseC(watts: number, airflowM3h: number): number {
  if (!(airflowM3h > 0)) return 0;
  return watts / (AIR_DENSITY_KG_M3 * AIR_CP_J_KG_K * (airflowM3h / 3600));
}

/** US form of the same balance: BTU/h = 1.08 × CFM × ΔT°F. */
export function sensibleHeatBtuh(cfm: number, deltaTF: number): number {
  return SENSIBLE_HEAT_FACTOR_US * cfm * deltaTF;
}

export function wattsToBtuh(watts: number): number {
  return watts * BTUH_PER_W;
}

export function computeHeatOutput(input: HeatOutputInput): HeatOutput {
  // Without a fan nothing carries heat out of the box, and the linear curve
  // (measured under forced flow) no longer applies; report no delivered heat
  // rather than an infinite temperature rise.
  if (!(input.airflowM3h > 0)) {
    return { efficiency: 0, usefulW: 0, usefulBtuh: 0, airRiseC: 0, outletC: input.inletC };
  }
  const efficiency = collectorEfficiency(
    input.eta0,
    input.a1,
    input.inletC - input.ambientC,
    input.irradianceWm2,
  );
  const usefulW = efficiency * input.irradianceWm2 * input.apertureAreaM2;
  const airRiseC = airTemperatureRiseC(usefulW, input.airflowM3h);
  return {
    efficiency,
    usefulW,
    usefulBtuh: wattsToBtuh(usefulW),
    airRiseC,
    outletC: input.inletC + airRiseC,
  };
}

/** The contract's fixed reference sunlight for a rating-style figure, W/m² (not what any given wall receives). */
export const RATING_IRRADIANCE_WM2 = 800;

/**
 * The planner's headline: the heat at the clear-day peak sunlight on the
 * chosen wall and day (from `clearDayEnergy`). A wall the sun never reaches
 * that day (peak 0) delivers nothing, said as zeros, not as an error.
 */
export function heatAtPeak(input: Omit<HeatOutputInput, "irradianceWm2">, peakWm2: number): HeatOutput {
  if (!(peakWm2 > 0)) return { efficiency: 0, usefulW: 0, usefulBtuh: 0, airRiseC: 0, outletC: input.inletC };
  return computeHeatOutput({ ...input, irradianceWm2: peakWm2 });
}
