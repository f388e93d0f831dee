import { validateComposition, type Composition } from "../composition";
import { InputError } from "../errors";
import type { WithWarnings } from "../validate";

type FactorElement = "C" | "Mn" | "Si" | "Ni" | "Cr" | "Mo" | "Cu" | "V";
const FACTOR_ELEMENTS: readonly FactorElement[] = ["C", "Mn", "Si", "Ni", "Cr", "Mo", "Cu", "V"];

/**
 * Ranges (mass %) over which the ASTM A255 multiplying factors are defined; outside them
 * idealCriticalDiameterIn rejects the composition. Ni stops at 1.5 %: the factor formula held
 * here (1 + 0.363Ni) is the ≤ 1.5 % piece; A255's table beyond it is not implemented.
 * Source: science-reference §5.3 [Checked: public reproduction of ASTM A255-10(2014)].
 */
export const GROSSMANN_FACTOR_RANGES: Readonly<Record<FactorElement, readonly [number, number]>> = Object.freeze({
  C: [0.01, 0.9],
  Mn: [0, 1.95],
  Si: [0, 2.0],
  Ni: [0, 1.5],
  Cr: [0, 2.5],
  Mo: [0, 0.55],
  Cu: [0, 0.55],
  V: [0, 0.2],
});

/**
 * Composition range to which ASTM A255-10(2014) §1.3 restricts the calculation method; inside
 * the factor ranges but outside these the result carries a warning.
 * Source: ASTM A255-10 (Reapproved 2014) §1.3 [Checked: scope text].
 */
export const ASTM_A255_CALCULATION_RANGES: Readonly<Record<FactorElement, readonly [number, number]>> = Object.freeze({
  C: [0.1, 0.7],
  Mn: [0.5, 1.65],
  Si: [0.15, 0.6],
  Ni: [0, 1.5],
  Cr: [0, 1.35],
  Mo: [0, 0.55],
  Cu: [0, 0.35],
  V: [0, 0.2],
});

/** Result of idealCriticalDiameterIn: DI in inches (value) and mm, the factors, and warnings. */
export interface IdealCriticalDiameterResult extends WithWarnings<number> {
  /** Ideal critical diameter DI, inches (same as value). */
  value: number;
  /** DI in millimetres. */
  valueMm: number;
  /** The multiplying factor of each element. */
  factors: Record<FactorElement, number>;
}

function carbonFactor(c: number): number {
  if (c <= 0.39) return 0.54 * c;
  if (c <= 0.55) return 0.171 + 0.001 * c + 0.265 * c * c;
  if (c <= 0.65) return 0.115 + 0.268 * c - 0.038 * c * c;
  if (c <= 0.75) return 0.143 + 0.2 * c;
  return 0.062 + 0.409 * c - 0.135 * c * c;
}

/**
 * Grossmann ideal critical diameter DI (inches) for austenite grain size No. 7, the product of
 * the ASTM A255 multiplying factors f_C·f_Mn·f_Si·f_Ni·f_Cr·f_Mo·f_Cu·f_V.
 * Rejects any element outside GROSSMANN_FACTOR_RANGES with an InputError naming the element and
 * its range (so most tool and stainless steels are out of scope); warns outside A255's own
 * calculation range (§1.3) and for W, which the method ignores.
 * Example: 4140-type (C 0.40, Mn 0.875, Si 0.25, Cr 0.95, Mo 0.20) → 4.805 in.
 * Source: ASTM A255-10(2014) [Checked: public reproduction, three independent codes];
 * science-reference §5.3.
 */
export function idealCriticalDiameterIn(comp: Composition): IdealCriticalDiameterResult {
  const c = validateComposition(comp);
  for (const el of FACTOR_ELEMENTS) {
    const [lo, hi] = GROSSMANN_FACTOR_RANGES[el];
    if (c[el] < lo || c[el] > hi) {
      throw new InputError(`composition.${el}`, c[el], `${lo}–${hi} mass % (range of the ASTM A255 multiplying factor for ${el})`);
    }
  }
  const factors: Record<FactorElement, number> = {
    C: carbonFactor(c.C),
    Mn: c.Mn <= 1.2 ? 1 + 3.3333 * c.Mn : 5.1 * c.Mn - 1.12,
    Si: 1 + 0.7 * c.Si,
    Ni: 1 + 0.363 * c.Ni,
    Cr: 1 + 2.16 * c.Cr,
    Mo: 1 + 3.0 * c.Mo,
    Cu: 1 + 0.365 * c.Cu,
    V: 1 + 1.73 * c.V,
  };
  let di = 1;
  for (const el of FACTOR_ELEMENTS) di *= factors[el];
  const warnings: string[] = [];
  for (const el of FACTOR_ELEMENTS) {
    const [lo, hi] = ASTM_A255_CALCULATION_RANGES[el];
    if (c[el] < lo || c[el] > hi) warnings.push(`${el} = ${c[el]} % is outside the ASTM A255 calculation range ${lo}–${hi} %.`);
  }
  if (c.W > 0) warnings.push("W has no ASTM A255 multiplying factor and is ignored.");
  return { value: di, valueMm: di * 25.4, factors, warnings };
}
