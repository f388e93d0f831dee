import { requireInRange, requirePositive } from "../validate";
import { InputError } from "../errors";
import { checkSegregationInputs, rejectFullySolidScheil } from "./segregation-inputs";

/**
 * Scheil–Gulliver (no diffusion in the solid, well-mixed liquid): solid forming at the
 * interface, C_s* = k·C0·(1 − f_s)^(k − 1), units of c0 (mass %). 0 < k < 1, 0 ≤ f_s < 1.
 * Source: Scheil (1942) [Pub, mem]; science-reference §3.1 [Computed checks].
 */
export function scheilSolidComposition(c0: number, k: number, solidFraction: number): number {
  checkSegregationInputs(c0, k, solidFraction, true);
  if (solidFraction >= 1) rejectFullySolidScheil(solidFraction);
  return k * c0 * Math.pow(1 - solidFraction, k - 1);
}

/**
 * Scheil–Gulliver liquid composition C_L = C0·(1 − f_s)^(k − 1) (units of c0, mass %).
 * Rises without bound as f_s → 1 for k < 1, hence f_s = 1 is rejected.
 * Source: science-reference §3.1.
 */
export function scheilLiquidComposition(c0: number, k: number, solidFraction: number): number {
  checkSegregationInputs(c0, k, solidFraction, true);
  if (solidFraction >= 1) rejectFullySolidScheil(solidFraction);
  return c0 * Math.pow(1 - solidFraction, k - 1);
}

/**
 * Mean composition of all solid formed up to f_s under Scheil, (1/f_s)∫₀^f_s C_s* df
 * = C0·(1 − (1 − f_s)^k)/f_s (units of c0). Equals k·C0 at f_s = 0 (limit).
 * Source: integral of the Scheil equation, science-reference §3.1 mass balance.
 */
export function scheilMeanSolidComposition(c0: number, k: number, solidFraction: number): number {
  checkSegregationInputs(c0, k, solidFraction, true);
  if (solidFraction >= 1) return c0;
  if (solidFraction === 0) return k * c0;
  // −expm1(k·log1p(−f)) keeps precision at small f.
  return (-c0 * Math.expm1(k * Math.log1p(-solidFraction))) / solidFraction;
}

/**
 * Liquid fraction left when the Scheil liquid reaches the eutectic composition C_E:
 * f_L = (C_E/C0)^(1/(k − 1)) (dimensionless). C0 must not exceed C_E (returns 1 at C0 = C_E).
 * Example: Fe–C, k 0.34, C_E 4.3 → 0.11 of liquid at 1 % C (shows why Scheil is wrong for
 * fast-diffusing carbon). Source: science-reference §3.1 check 6 [Computed].
 */
export function scheilLiquidFractionAtEutectic(c0: number, k: number, eutecticComposition: number): number {
  requirePositive("c0 (nominal composition, mass %)", c0);
  requireInRange("k (partition coefficient)", k, { min: 0, max: 1, minExclusive: true, maxExclusive: true });
  requirePositive("eutecticComposition (mass %)", eutecticComposition);
  if (c0 > eutecticComposition) {
    throw new InputError("c0 (nominal composition, mass %)", c0, `≤ the eutectic composition ${eutecticComposition} (hypo-eutectic alloys only)`);
  }
  return Math.pow(eutecticComposition / c0, 1 / (k - 1));
}
