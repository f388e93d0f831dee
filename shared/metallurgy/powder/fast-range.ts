import { requireInRange, type RangeOptions } from "../validate";

/**
 * Hot-path range check: a plain comparison when the value is valid, and requireInRange (which
 * builds the InputError message) only when it is not. Same semantics as requireInRange.
 * Internal helper of the powder module (not re-exported).
 */
export function checkRange(parameter: string, value: number, min: number, max: number, minExclusive = false, maxExclusive = false): number {
  const lowOk = minExclusive ? value > min : value >= min;
  const highOk = maxExclusive ? value < max : value <= max;
  if (lowOk && highOk) return value; // NaN fails both comparisons and falls through
  const opts: RangeOptions = { minExclusive, maxExclusive };
  if (Number.isFinite(min)) opts.min = min;
  if (Number.isFinite(max)) opts.max = max;
  return requireInRange(parameter, value, opts);
}
