import { InputError } from "../errors";
import { requireInRange, requirePositive, type WithWarnings } from "../validate";

/** Hollomon–Jaffe constant C for steels with time in hours [Checked]. */
export const HOLLOMON_JAFFE_CONSTANT = 20;

const KELVIN = 273.15;

function checkConstant(constant: number): void {
  requireInRange("constant", constant, { min: 0, max: 50, minExclusive: true });
}

function temperatureWarnings(tempC: number): string[] {
  return tempC < 100 || tempC > 700 ? [`Tempering at ${tempC} °C is outside the 100–700 °C range where the Hollomon–Jaffe parameter is used.`] : [];
}

/**
 * Hollomon–Jaffe tempering parameter P = T_K·(C + log10 t_h), T in kelvin, t in HOURS
 * (the time unit and C are fixed together: C = 20 goes with hours). Equal P ≈ equal tempered
 * hardness. Rejects t ≤ 0, T ≤ 0 K, C outside (0, 50]; warns outside 100–700 °C.
 * Example: 200 °C, 2 h → 9605.43.
 * Source: Hollomon & Jaffe (1945), Trans. AIME 162, 223 [Pub, mem; engineering form Checked];
 * science-reference §5.1.
 */
export function temperingParameter(tempC: number, hours: number, constant = HOLLOMON_JAFFE_CONSTANT): WithWarnings<number> {
  requireInRange("tempC", tempC, { min: -KELVIN, minExclusive: true });
  requirePositive("hours", hours);
  checkConstant(constant);
  return { value: (tempC + KELVIN) * (constant + Math.log10(hours)), warnings: temperatureWarnings(tempC) };
}

/**
 * Time at tempC that gives the same Hollomon–Jaffe parameter, hours: t = 10^(P/T_K − C).
 * Example: P of 200 °C/2 h reached at 220 °C in 0.3004 h.
 * Rejects P ≤ 0, T ≤ 0 K and results that overflow; warns outside 100–700 °C.
 * Source: science-reference §5.1.
 */
export function equivalentTemperingHours(parameter: number, tempC: number, constant = HOLLOMON_JAFFE_CONSTANT): WithWarnings<number> {
  requirePositive("parameter", parameter);
  requireInRange("tempC", tempC, { min: -KELVIN, minExclusive: true });
  checkConstant(constant);
  const hours = Math.pow(10, parameter / (tempC + KELVIN) - constant);
  if (!Number.isFinite(hours) || hours <= 0) {
    throw new InputError("parameter", parameter, `a value that gives a finite, positive time at ${tempC} °C`);
  }
  return { value: hours, warnings: temperatureWarnings(tempC) };
}

/**
 * Carbon-dependent Hollomon–Jaffe constant C = 21.3 − 5.8·(mass % C) (for time in hours).
 * Example: 1.0 % C → 15.5. Rejects C outside 0–2.11 % (steel range).
 * Source: science-reference §5.1 [Checked: used in public heat-treatment code; attributed to
 * the original work, primary source not checked].
 */
export function temperingConstantForCarbon(carbonMassPct: number): number {
  requireInRange("carbonMassPct", carbonMassPct, { min: 0, max: 2.11 });
  return 21.3 - 5.8 * carbonMassPct;
}
