import { validateComposition, type Composition } from "../composition";

/**
 * Composition limits that define a stainless steel in EN 10088-1:
 * at least 10.5 mass % Cr and at most 1.2 mass % C. [Checked] science-reference §1a.
 */
export const STAINLESS_LIMITS = { minChromiumMassPct: 10.5, maxCarbonMassPct: 1.2 } as const;

/**
 * True when a composition (mass %) meets the EN 10088-1 definition of stainless steel
 * (Cr ≥ 10.5 and C ≤ 1.2). A definition by composition only: it says nothing about
 * carbide-bound chromium or actual corrosion behaviour. Throws InputError for a bad composition.
 */
export function isStainless(comp: Composition): boolean {
  const c = validateComposition(comp);
  return c.Cr >= STAINLESS_LIMITS.minChromiumMassPct && c.C <= STAINLESS_LIMITS.maxCarbonMassPct;
}
