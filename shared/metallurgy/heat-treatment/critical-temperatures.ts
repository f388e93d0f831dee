import { validateComposition, type Composition } from "../composition";
import { requireInRange } from "../validate";
import { IRON_CARBON_POINTS } from "./iron-carbon-diagram";

const ASM = IRON_CARBON_POINTS.asm;
/** Slope of the straight Acm line between the ASM eutectoid and (2.11 %, 1148 °C), °C per mass % C (≈ 314.18). */
export const ACM_SLOPE_C_PER_MASS_PCT =
  (ASM.maxCarbonInAustenite.tempC - ASM.eutectoid.tempC) / (ASM.maxCarbonInAustenite.carbonMassPct - ASM.eutectoid.carbonMassPct);

/**
 * A3 of plain-carbon hypoeutectoid steel (binary, Andrews form), °C: 910 − 203·√C.
 * Only for 0 ≤ C ≤ 0.77 (rejected otherwise). Example: 0.4 % C → 781.6 °C.
 * Source: Andrews (1965), J. Iron Steel Inst. 203, 721 [Mem]; science-reference §5.2.
 */
export function a3TempC(carbonMassPct: number): number {
  requireInRange("carbonMassPct", carbonMassPct, { min: 0, max: ASM.eutectoid.carbonMassPct });
  return 910 - 203 * Math.sqrt(carbonMassPct);
}

/**
 * Ac3 of alloyed hypoeutectoid steel (Andrews), °C:
 * 910 − 203√C − 15.2Ni + 44.7Si + 104V + 31.5Mo + 13.1W. C limited to 0–0.77 %.
 * Source: Andrews (1965) [Mem]; science-reference §5.2.
 */
export function ac3TempC(comp: Composition): number {
  const c = validateComposition(comp);
  requireInRange("composition.C", c.C, { min: 0, max: ASM.eutectoid.carbonMassPct });
  return 910 - 203 * Math.sqrt(c.C) - 15.2 * c.Ni + 44.7 * c.Si + 104 * c.V + 31.5 * c.Mo + 13.1 * c.W;
}

/**
 * Acm of hypereutectoid steel as a straight line, °C: 727 + 314.18·(C − 0.77), between the
 * ASM eutectoid and (2.11 % C, 1148 °C); the real line is slightly curved (±15 °C).
 * Only for 0.77 ≤ C ≤ 2.11 (rejected otherwise). Example: 1.0 % C → 799.3 °C.
 * Source: science-reference §5.2 [Computed].
 */
export function acmTempC(carbonMassPct: number): number {
  requireInRange("carbonMassPct", carbonMassPct, { min: ASM.eutectoid.carbonMassPct, max: ASM.maxCarbonInAustenite.carbonMassPct });
  return ASM.eutectoid.tempC + ACM_SLOPE_C_PER_MASS_PCT * (carbonMassPct - ASM.eutectoid.carbonMassPct);
}

/**
 * Carbon in austenite on the straight Acm line at tempC (727–1148 °C), mass %:
 * C_γ = 0.77 + (T − 727)/314.18. Example: 760 °C → 0.875 %. (Used for the dissolved carbon
 * of hypereutectoid steels when hardening.) Source: science-reference §5.2 [Computed].
 */
export function austeniteCarbonOnAcmMassPct(tempC: number): number {
  requireInRange("tempC", tempC, { min: ASM.eutectoid.tempC, max: ASM.maxCarbonInAustenite.tempC });
  return ASM.eutectoid.carbonMassPct + (tempC - ASM.eutectoid.tempC) / ACM_SLOPE_C_PER_MASS_PCT;
}

/**
 * Ac1 (Andrews), °C: 723 − 10.7Mn − 16.9Ni + 29.1Si + 16.9Cr (other elements ignored).
 * Source: Andrews (1965) [Mem]; science-reference §5.2.
 */
export function ac1TempC(comp: Composition): number {
  const c = validateComposition(comp);
  return 723 - 10.7 * c.Mn - 16.9 * c.Ni + 29.1 * c.Si + 16.9 * c.Cr;
}
