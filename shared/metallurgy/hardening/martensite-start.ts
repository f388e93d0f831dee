import { validateComposition, type Composition } from "../composition";
import { InputError } from "../errors";
import { requireInRange, warnOutside, type WithWarnings } from "../validate";

const ABSOLUTE_ZERO_C = -273.15;

/**
 * Martensite-start temperature (°C), Andrews (1965) linear formula:
 * Ms = 539 − 423C − 30.4Mn − 17.7Ni − 12.1Cr − 7.5Mo, contents in mass % **in solution** (feed the
 * hardenedState solution, not bulk values). [Checked, many implementations; original Pub, mem]
 * science-reference §2.4. Underestimates Ms above 0.6 % C. See andrewsMsWithWarnings.
 */
export function andrewsMsC(comp: Composition): number {
  return andrewsMsWithWarnings(comp).value;
}

/** andrewsMsC plus warnings outside Andrews' data set (C 0.11–0.6, Cr ≤ 4.6, Ni ≤ 5, Mo ≤ 5.4, Mn ≤ 4.9 [Mem]). */
export function andrewsMsWithWarnings(comp: Composition): WithWarnings<number> {
  const c = validateComposition(comp);
  const warnings: string[] = [];
  warnOutside(warnings, "C", c.C, 0.11, 0.6, "Andrews (1965) Ms");
  warnOutside(warnings, "Cr", c.Cr, 0, 4.6, "Andrews (1965) Ms");
  warnOutside(warnings, "Ni", c.Ni, 0, 5, "Andrews (1965) Ms");
  warnOutside(warnings, "Mo", c.Mo, 0, 5.4, "Andrews (1965) Ms");
  warnOutside(warnings, "Mn", c.Mn, 0, 4.9, "Andrews (1965) Ms");
  if (c.C > 0.6) warnings.push("Above 0.6 % C the linear formula underestimates Ms (e.g. 178 °C for 0.8 % C where handbooks show ≈ 220 °C).");
  const value = 539 - 423 * c.C - 30.4 * c.Mn - 17.7 * c.Ni - 12.1 * c.Cr - 7.5 * c.Mo;
  if (value <= ABSOLUTE_ZERO_C) {
    throw new InputError("composition", comp, "contents for which the linear Ms formula stays above absolute zero");
  }
  if (value < -100) warnings.push(`Ms = ${value.toFixed(0)} °C: no martensite forms even with deep cryogenic treatment.`);
  return { value, warnings };
}

/** Koistinen–Marburger rate constant for plain and low-alloy steels, 1/K [Pub, mem; formula Checked]. */
export const KOISTINEN_MARBURGER_RATE_PER_K = 0.011;

/**
 * Retained austenite fraction after quenching to quenchTempC (°C) for a steel with martensite start msC:
 * f_RA = exp(−0.011·(Ms − T)) for T < Ms, else 1 (no martensite). Koistinen & Marburger (1959)
 * [formula Checked]; science-reference §2.4. Temperatures must lie above absolute zero.
 */
export function retainedAusteniteFraction(msC: number, quenchTempC: number, ratePerK: number = KOISTINEN_MARBURGER_RATE_PER_K): number {
  const ms = requireInRange("msC", msC, { min: ABSOLUTE_ZERO_C, minExclusive: true, max: 1000 });
  const t = requireInRange("quenchTempC", quenchTempC, { min: ABSOLUTE_ZERO_C, minExclusive: true, max: 1000 });
  const k = requireInRange("ratePerK", ratePerK, { min: 0, minExclusive: true, max: 1 });
  if (t >= ms) return 1;
  return Math.exp(-k * (ms - t));
}
