import { InputError } from "./errors";

/** A computed value together with the calibration warnings that apply to its inputs. */
export interface WithWarnings<T> {
  value: T;
  warnings: string[];
}

export interface RangeOptions {
  min?: number;
  max?: number;
  /** Exclude the bound itself (x > min rather than x >= min). */
  minExclusive?: boolean;
  maxExclusive?: boolean;
}

/** Rejects non-finite numbers and values outside [min, max]; returns the value for chaining. */
export function requireInRange(parameter: string, value: number, opts: RangeOptions = {}): number {
  const { min, max, minExclusive = false, maxExclusive = false } = opts;
  const allowed = describeRange(opts);
  if (typeof value !== "number" || !Number.isFinite(value)) throw new InputError(parameter, value, allowed);
  if (min !== undefined && (minExclusive ? value <= min : value < min)) throw new InputError(parameter, value, allowed);
  if (max !== undefined && (maxExclusive ? value >= max : value > max)) throw new InputError(parameter, value, allowed);
  return value;
}

export function requirePositive(parameter: string, value: number): number {
  return requireInRange(parameter, value, { min: 0, minExclusive: true });
}

export function requireNonNegative(parameter: string, value: number): number {
  return requireInRange(parameter, value, { min: 0 });
}

export function requireInteger(parameter: string, value: number, opts: RangeOptions = {}): number {
  requireInRange(parameter, value, opts);
  if (!Number.isInteger(value)) throw new InputError(parameter, value, `an integer ${describeRange(opts)}`);
  return value;
}

export function requireOneOf<T extends string | number>(parameter: string, value: T, allowed: readonly T[]): T {
  if (!allowed.includes(value)) throw new InputError(parameter, value, `one of ${allowed.join(", ")}`);
  return value;
}

/** Adds a warning when the value lies outside a model's calibration range (but inside the valid range). */
export function warnOutside(warnings: string[], label: string, value: number, min: number, max: number, model: string): void {
  if (value < min || value > max) {
    warnings.push(`${label} = ${round(value)} is outside the ${model} calibration range (${min}–${max}); treat the result as an extrapolation.`);
  }
}

function describeRange({ min, max, minExclusive, maxExclusive }: RangeOptions): string {
  const lo = min === undefined ? "" : `${minExclusive ? ">" : "≥"} ${min}`;
  const hi = max === undefined ? "" : `${maxExclusive ? "<" : "≤"} ${max}`;
  if (lo && hi) return `a finite number ${lo} and ${hi}`;
  if (lo) return `a finite number ${lo}`;
  if (hi) return `a finite number ${hi}`;
  return "a finite number";
}

function round(x: number): string {
  return Number.isInteger(x) ? String(x) : x.toPrecision(4);
}
