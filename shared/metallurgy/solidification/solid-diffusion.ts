import type { Element } from "../composition";
import { InputError } from "../errors";
import { requireInRange } from "../validate";
import type { PrimaryPhase } from "./partition-data";

/** Arrhenius diffusion data D = D0·exp(−Q/RT) of a solute in solid iron. */
export interface SolidDiffusionDatum {
  /** Pre-exponential factor, m²/s. */
  readonly d0M2PerS: number;
  /** Activation energy, J/mol. */
  readonly activationJPerMol: number;
  readonly source: string;
}

const CAL_TO_J = 4.184;
/** Molar gas constant, J/(mol·K) (CODATA 2018). */
const GAS_CONSTANT = 8.314462618;

/**
 * Diffusion coefficients of solutes in solid steel used for back-diffusion during freezing.
 * C: Won & Thomas (2001) implementation, D in cm²/s with Q in cal/mol (converted) [Checked].
 * Cr, Mo, V in austenite: science-reference §2.5 [Checked]. Other elements have no data here,
 * and the ingot solver treats them as non-diffusing (Scheil).
 */
export const SOLID_DIFFUSION_DATA: Readonly<Partial<Record<Element, Partial<Record<PrimaryPhase, SolidDiffusionDatum>>>>> =
  Object.freeze({
    C: {
      delta: { d0M2PerS: 0.0127e-4, activationJPerMol: 19450 * CAL_TO_J, source: "[Checked] Won & Thomas 2001 implementation" },
      gamma: { d0M2PerS: 0.0761e-4, activationJPerMol: 32160 * CAL_TO_J, source: "[Checked] Won & Thomas 2001 implementation" },
    },
    Cr: { gamma: { d0M2PerS: 0.27e-4, activationJPerMol: 246e3, source: "[Checked] austenitic steel, 800–1200 °C (science-reference §2.5)" } },
    Mo: { gamma: { d0M2PerS: 3.6e-2 * 1e-4, activationJPerMol: 239.8e3, source: "[Checked] γ-Fe (science-reference §2.5)" } },
    V: { gamma: { d0M2PerS: 0.62e-4, activationJPerMol: 272.4e3, source: "[Checked] radiotracer data 1987 (science-reference §2.5)" } },
  });

/** True when SOLID_DIFFUSION_DATA holds a diffusivity for this element and phase. */
export function hasSolidDiffusionData(element: Element, phase: PrimaryPhase = "gamma"): boolean {
  return SOLID_DIFFUSION_DATA[element]?.[phase] !== undefined;
}

/**
 * Diffusivity of a solute in the solid primary phase, D = D0·exp(−Q/RT), in m²/s.
 * Example: C in austenite at 1400 °C ≈ 4.8e-10 m²/s; V ≈ 1.9e-13 m²/s.
 * Rejects elements without data and temperatures outside 500–1600 °C.
 * Source: SOLID_DIFFUSION_DATA (Won & Thomas 2001; science-reference §2.5).
 */
export function soluteDiffusivityInSolidM2PerS(element: Element, tempC: number, phase: PrimaryPhase = "gamma"): number {
  const datum = SOLID_DIFFUSION_DATA[element]?.[phase];
  if (!datum) throw new InputError("element", element, `an element with diffusion data in ${phase} (C; Cr, Mo, V in gamma)`);
  requireInRange("tempC", tempC, { min: 500, max: 1600 });
  return arrheniusDiffusivity(datum, tempC);
}

/** D0·exp(−Q/RT) without validation (inner loops). */
export function arrheniusDiffusivity(datum: SolidDiffusionDatum, tempC: number): number {
  return datum.d0M2PerS * Math.exp(-datum.activationJPerMol / (GAS_CONSTANT * (tempC + 273.15)));
}
