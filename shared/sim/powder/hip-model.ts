/**
 * Hot isostatic pressing of the canned powder: relative density against pressure and
 * temperature from the core's yield-limited HIP-map formulas, and the can's linear shrinkage.
 * The yield strength of hot austenite falls with temperature; we take σ_y = 30 MPa at 1150 °C
 * (inside the 20–50 MPa the reference recalls for austenite near 1150 °C) and let it double
 * for every 100 °C lower — an [App] teaching curve, not data for any grade.
 */
import { hipLinearShrinkage, hipRelativeDensity, type HipResult } from "../../metallurgy/powder/hip";

/** Tap density of the powder in the can before pressing [Mem, 0.62–0.68]. */
export const TAP_DENSITY = 0.64;
export const YIELD_AT_1150_MPA = 30;
export const YIELD_DOUBLING_PER_C = 100;

export function hotYieldStrengthMPa(tempC: number): number {
  return YIELD_AT_1150_MPA * 2 ** ((1150 - tempC) / YIELD_DOUBLING_PER_C);
}

export interface HipOutcome extends HipResult {
  yieldStrengthMPa: number;
  /** Linear shrinkage of the can from tap density to the density reached, fraction. */
  linearShrinkage: number;
  /** Linear shrinkage to full density, fraction (what the can finally shrinks once creep closes the rest). */
  fullDensityShrinkage: number;
}

export function hipOutcome(pressureMPa: number, tempC: number, tapDensity = TAP_DENSITY): HipOutcome {
  const yieldStrengthMPa = hotYieldStrengthMPa(tempC);
  const result = hipRelativeDensity({ initialDensity: tapDensity, pressureMPa, yieldStrengthMPa });
  return {
    ...result,
    yieldStrengthMPa,
    linearShrinkage: hipLinearShrinkage(tapDensity, Math.max(tapDensity, result.relativeDensity)),
    fullDensityShrinkage: hipLinearShrinkage(tapDensity, 1),
  };
}

export const HIP_CURVE_TEMPS_C = [900, 1000, 1100, 1150, 1200] as const;

/** Relative density against pressure at several temperatures, for the chart. */
export function hipCurves(pressures: readonly number[] = defaultPressures()): { pressureMPa: number; [temp: string]: number }[] {
  return pressures.map((p) => {
    const row: { pressureMPa: number; [temp: string]: number } = { pressureMPa: p };
    for (const t of HIP_CURVE_TEMPS_C) row[`t${t}`] = hipOutcome(p, t).relativeDensity;
    return row;
  });
}

function defaultPressures(): number[] {
  const out: number[] = [];
  for (let p = 10; p <= 300; p += 5) out.push(p);
  return out;
}
