import { InputError } from "../errors";
import { requireInRange, requirePositive } from "../validate";

/**
 * Shared input checks of the segregation closed forms (science-reference §3.1):
 * C0 > 0, 0 < k < 1 (k ≥ 1 is inverse segregation, out of scope), solid fraction in range.
 * Internal helper, not part of the public API.
 */
export function checkSegregationInputs(c0: number, k: number, solidFraction: number, allowFullySolid: boolean): void {
  requirePositive("c0 (nominal composition, mass %)", c0);
  requireInRange("k (partition coefficient)", k, { min: 0, max: 1, minExclusive: true, maxExclusive: true });
  requireInRange("solidFraction", solidFraction, { min: 0, max: 1, maxExclusive: !allowFullySolid });
}

/** Throws the InputError for f_s = 1 in the Scheil forms. */
export function rejectFullySolidScheil(solidFraction: number): never {
  throw new InputError("solidFraction", solidFraction, "< 1 for Scheil (the last liquid composition diverges)");
}
