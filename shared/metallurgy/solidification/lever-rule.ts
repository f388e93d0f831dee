import { checkSegregationInputs } from "./segregation-inputs";

/**
 * Lever rule (complete diffusion in solid and liquid): composition of the solid at the
 * interface, C_s* = k·C0 / (1 − (1 − k)·f_s), in the units of c0 (mass %).
 * At equilibrium the whole solid has this composition and ends at C0 when f_s = 1.
 * Source: science-reference §3.1 (lever rule) [Computed checks].
 */
export function leverSolidComposition(c0: number, k: number, solidFraction: number): number {
  checkSegregationInputs(c0, k, solidFraction, true);
  return (k * c0) / (1 - (1 - k) * solidFraction);
}

/**
 * Lever rule liquid composition C_L = C0 / (1 − (1 − k)·f_s) (units of c0, mass %).
 * Source: science-reference §3.1.
 */
export function leverLiquidComposition(c0: number, k: number, solidFraction: number): number {
  checkSegregationInputs(c0, k, solidFraction, true);
  return c0 / (1 - (1 - k) * solidFraction);
}
