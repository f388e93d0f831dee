import { validateComposition, type Composition } from "../composition";
import { requireInRange, requireOneOf, type WithWarnings } from "../validate";
import { STAINLESS_LIMITS } from "./stainless-definition";

export interface PrenOptions {
  /** Factor on N: 16 (ISO 15156-3 / NACE MR0175 form, default) or 30 (variant used for some grades). */
  nitrogenFactor?: 16 | 30;
  /**
   * Use this Cr (mass %) instead of the bulk Cr, e.g. the free Cr of the matrix from
   * chromiumTiedInCarbide: "PREN of the matrix", a teaching extension [App].
   */
  chromiumMassPct?: number;
}

/**
 * Pitting resistance equivalent number PREN = Cr + 3.3·(Mo + 0.5·W) + 16·N (mass %).
 * [Checked] ISO 15156-3 / NACE MR0175 W-inclusive form; N factor 30 as a variant.
 * A ranking index within one family, not a corrosion rate. See prenWithWarnings for calibration warnings.
 */
export function pren(comp: Composition, opts: PrenOptions = {}): number {
  return prenWithWarnings(comp, opts).value;
}

/** PREN (see pren) together with warnings, e.g. when Cr < 10.5 % (not a corrosion-resistant family). */
export function prenWithWarnings(comp: Composition, opts: PrenOptions = {}): WithWarnings<number> {
  const c = validateComposition(comp);
  const nitrogenFactor = requireOneOf("nitrogenFactor", opts.nitrogenFactor ?? 16, [16, 30] as const);
  const cr = opts.chromiumMassPct === undefined ? c.Cr : requireInRange("chromiumMassPct", opts.chromiumMassPct, { min: 0, max: 100 });
  const warnings: string[] = [];
  if (cr < STAINLESS_LIMITS.minChromiumMassPct) {
    warnings.push(`Cr = ${cr} % is below 10.5 %: PREN ranks corrosion-resistant (stainless) grades only; this steel is not one.`);
  }
  const value = cr + 3.3 * (c.Mo + 0.5 * c.W) + nitrogenFactor * c.N;
  return { value, warnings };
}
