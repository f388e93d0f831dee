import { requireInRange, requireNonNegative, requireOneOf, type WithWarnings } from "../validate";

const R_J_PER_MOL_K = 8.314462618; // CODATA

export type CarbideFormer = "V" | "Cr" | "Mo";

export interface AusteniteDiffusionDatum {
  /** Pre-exponential factor D0, cm²/s. */
  d0Cm2PerS: number;
  /** Activation energy Q, J/mol. */
  activationJPerMol: number;
  tag: string;
  source: string;
}

/**
 * Diffusion of carbide-forming metals in austenite (science-reference §2.5): the slowest metal solute
 * controls carbide coarsening.
 */
export const AUSTENITE_DIFFUSION_DATA: Readonly<Record<CarbideFormer, AusteniteDiffusionDatum>> = {
  V: { d0Cm2PerS: 0.62, activationJPerMol: 272.4e3, tag: "[Checked]", source: "radiotracer data (1987): 65.1 kcal/mol" },
  Cr: { d0Cm2PerS: 0.27, activationJPerMol: 246e3, tag: "[Checked]", source: "Cr in austenitic steel, 800–1200 °C" },
  Mo: { d0Cm2PerS: 3.6e-2, activationJPerMol: 239.8e3, tag: "[Checked]", source: "Mo in γ-Fe" },
};

function kelvin(parameter: string, tempC: number): number {
  return requireInRange(parameter, tempC, { min: -273.15, minExclusive: true }) + 273.15;
}

function coarseningWarnings(warnings: string[], label: string, tempC: number): void {
  if (tempC < 500) warnings.push(`${label} = ${tempC} °C is below 500 °C: carbides practically do not coarsen there.`);
  if (tempC > 1300) warnings.push(`${label} = ${tempC} °C is above 1300 °C, beyond the range of the diffusion data.`);
}

/**
 * Arrhenius diffusivity D = D0·exp(−Q/RT) in m²/s, from D0 in cm²/s, Q in J/mol and T in °C.
 * Science-reference §2.5 (R = 8.314462618 J/(mol·K), CODATA).
 */
export function arrheniusDiffusivityM2PerS(d0Cm2PerS: number, activationJPerMol: number, tempC: number): number {
  requireNonNegative("d0Cm2PerS", d0Cm2PerS);
  requireNonNegative("activationJPerMol", activationJPerMol);
  const tK = kelvin("tempC", tempC);
  return d0Cm2PerS * 1e-4 * Math.exp(-activationJPerMol / (R_J_PER_MOL_K * tK));
}

/** Diffusivity (m²/s) of V, Cr or Mo in austenite at tempC, from AUSTENITE_DIFFUSION_DATA. */
export function austeniteDiffusivityM2PerS(element: CarbideFormer, tempC: number): number {
  requireOneOf("element", element, ["V", "Cr", "Mo"] as const);
  const d = AUSTENITE_DIFFUSION_DATA[element];
  return arrheniusDiffusivityM2PerS(d.d0Cm2PerS, d.activationJPerMol, tempC);
}

/**
 * Ratio of coarsening rate constants k(T)/k(T_ref) = exp(−Q/R·(1/T − 1/T_ref)) for the teaching form
 * k = k0·exp(−Q/RT), Q in J/mol, temperatures in °C. Science-reference §2.5. See the WithWarnings companion.
 */
export function coarseningRateRatio(activationJPerMol: number, tempC: number, refTempC: number): number {
  return coarseningRateRatioWithWarnings(activationJPerMol, tempC, refTempC).value;
}

/** coarseningRateRatio plus warnings when a temperature is below 500 °C or above 1300 °C. */
export function coarseningRateRatioWithWarnings(activationJPerMol: number, tempC: number, refTempC: number): WithWarnings<number> {
  requireNonNegative("activationJPerMol", activationJPerMol);
  const t = kelvin("tempC", tempC);
  const tRef = kelvin("refTempC", refTempC);
  const warnings: string[] = [];
  coarseningWarnings(warnings, "tempC", tempC);
  coarseningWarnings(warnings, "refTempC", refTempC);
  return { value: Math.exp((-activationJPerMol / R_J_PER_MOL_K) * (1 / t - 1 / tRef)), warnings };
}
