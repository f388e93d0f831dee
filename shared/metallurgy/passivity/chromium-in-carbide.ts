import { ironMassPct, MOLAR_MASS_G_PER_MOL, validateComposition, type Composition } from "../composition";
import { InfeasibleError } from "../errors";
import { requireInRange, requireOneOf } from "../validate";

/** Chromium carbides considered by the free-Cr calculation, with metal:carbon atoms per formula unit. */
export const CHROMIUM_CARBIDE_STOICHIOMETRY = {
  M23C6: { metalAtoms: 23, carbonAtoms: 6 },
  M7C3: { metalAtoms: 7, carbonAtoms: 3 },
} as const;
export type ChromiumCarbideType = keyof typeof CHROMIUM_CARBIDE_STOICHIOMETRY;

export interface ChromiumTiedOptions {
  /** Carbon (mass % of the alloy) that is in the carbide; default all of the alloy's carbon. Range 0 … C. */
  carbonInCarbideMassPct?: number;
  /** Cr share y of the metal sites, (Cr_y Fe_(1−y))_m C_n; default 1 (pure Cr carbide = worst case). Range (0, 1]. */
  chromiumShare?: number;
}

export interface ChromiumTiedResult {
  /** Cr bound in the carbide, mass % of the alloy. */
  tiedCrMassPct: number;
  /** Cr left in the matrix, mass % of the matrix (carbide mass removed). */
  freeCrMassPct: number;
  /** Carbide mass, mass % of the alloy (C + Cr + Fe bound). */
  carbideMassPct: number;
  /** Fe bound in the carbide, mass % of the alloy (0 for pure Cr carbide). */
  tiedFeMassPct: number;
  /** Carbon left in solution in the matrix, mass % of the matrix. */
  matrixCarbonMassPct: number;
}

/**
 * Chromium tied up when `carbonInCarbideMassPct` of carbon forms (Cr_y Fe_(1−y))23C6 or 7C3, and the free Cr
 * left in the matrix: Cr_tied = C_carb·m·y·M_Cr/(n·M_C); Cr_free = 100·(Cr − Cr_tied)/(100 − m_carb).
 * Masses per 100 g alloy. [Computed] science-reference §1c. An average: grain-boundary depletion is worse.
 * Throws InfeasibleError (reason 'insufficient-chromium') when the carbide would need more Cr than the alloy holds.
 */
export function chromiumTiedInCarbide(
  comp: Composition,
  carbide: ChromiumCarbideType,
  opts: ChromiumTiedOptions = {},
): ChromiumTiedResult {
  const c = validateComposition(comp);
  requireOneOf("carbide", carbide, ["M23C6", "M7C3"] as const);
  const carbonInCarbide =
    opts.carbonInCarbideMassPct === undefined
      ? c.C
      : requireInRange("carbonInCarbideMassPct", opts.carbonInCarbideMassPct, { min: 0, max: c.C });
  const y = opts.chromiumShare === undefined ? 1 : requireInRange("chromiumShare", opts.chromiumShare, { min: 0, minExclusive: true, max: 1 });

  const { metalAtoms: m, carbonAtoms: n } = CHROMIUM_CARBIDE_STOICHIOMETRY[carbide];
  const formulaMol = carbonInCarbide / (n * MOLAR_MASS_G_PER_MOL.C);
  const tiedCr = formulaMol * m * y * MOLAR_MASS_G_PER_MOL.Cr;
  const tiedFe = formulaMol * m * (1 - y) * MOLAR_MASS_G_PER_MOL.Fe;

  if (tiedCr > c.Cr + 1e-12) {
    throw new InfeasibleError(
      "insufficient-chromium",
      `Not enough chromium: ${carbonInCarbide} % C as ${carbide} (Cr share ${y}) needs ${tiedCr.toFixed(2)} % Cr, but the alloy holds only ${c.Cr} % Cr.`,
    );
  }
  const fe = ironMassPct(c);
  if (tiedFe > fe + 1e-12) {
    throw new InfeasibleError(
      "insufficient-iron",
      `Not enough iron: ${carbide} with Cr share ${y} needs ${tiedFe.toFixed(2)} % Fe, but the alloy holds only ${fe.toFixed(2)} % Fe.`,
    );
  }
  const carbideMass = carbonInCarbide + tiedCr + tiedFe;
  const matrixMass = 100 - carbideMass;
  // A matrix of zero mass only arises for absurd inputs; report zero rather than dividing by zero.
  const freeCr = matrixMass > 0 ? (100 * Math.max(0, c.Cr - tiedCr)) / matrixMass : 0;
  const matrixC = matrixMass > 0 ? (100 * Math.max(0, c.C - carbonInCarbide)) / matrixMass : 0;
  return {
    tiedCrMassPct: Math.min(tiedCr, c.Cr),
    freeCrMassPct: freeCr,
    carbideMassPct: carbideMass,
    tiedFeMassPct: tiedFe,
    matrixCarbonMassPct: matrixC,
  };
}
