import { MOLAR_MASS_G_PER_MOL } from "../composition";
import { requireInRange } from "../validate";

const M_CR = MOLAR_MASS_G_PER_MOL.Cr;
const M_FE = MOLAR_MASS_G_PER_MOL.Fe;

/**
 * Atom fraction of Cr in a binary Fe–Cr alloy from its Cr mass percent (0–100).
 * x = (w/M_Cr) / (w/M_Cr + (100 − w)/M_Fe); other elements are ignored. Science-reference §1a.
 */
export function chromiumAtomFraction(crMassPct: number): number {
  requireInRange("crMassPct", crMassPct, { min: 0, max: 100 });
  const nCr = crMassPct / M_CR;
  const nFe = (100 - crMassPct) / M_FE;
  return nCr / (nCr + nFe);
}

/**
 * Inverse of chromiumAtomFraction: Cr mass percent of a binary Fe–Cr alloy with Cr atom fraction x (0–1).
 * w = 100·x·M_Cr / (x·M_Cr + (1 − x)·M_Fe). Science-reference §1a.
 */
export function chromiumMassPctFromAtomFraction(x: number): number {
  requireInRange("x", x, { min: 0, max: 1 });
  return (100 * x * M_CR) / (x * M_CR + (1 - x) * M_FE);
}
