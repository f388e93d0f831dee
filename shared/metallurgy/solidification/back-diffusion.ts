import { InputError } from "../errors";
import { requireNonNegative, requirePositive } from "../validate";
import { checkSegregationInputs } from "./segregation-inputs";

/**
 * Clyne–Kurz back-diffusion parameter Ω(α) = α(1 − e^(−1/α)) − ½e^(−1/(2α)) (dimensionless).
 * Ω → 0 as α → 0 (Scheil) and Ω → ½ as α → ∞ (lever rule). α ≥ 0 is the solid-state
 * Fourier number (see fourierNumber).
 * Source: Clyne & Kurz (1981), Metall. Trans. A 12, 965 [Pub, mem; limits verified Computed];
 * science-reference §3.1 check 4.
 */
export function clyneKurzOmega(alpha: number): number {
  requireNonNegative("alpha (solid Fourier number)", alpha);
  return clyneKurzOmegaUnchecked(alpha);
}

/** Ω(α) without validation, for inner loops that validated their inputs once. */
export function clyneKurzOmegaUnchecked(alpha: number): number {
  if (alpha === 0) return 0;
  // −α·expm1(−1/α) = α(1 − e^(−1/α)) without cancellation for large α.
  return -alpha * Math.expm1(-1 / alpha) - 0.5 * Math.exp(-1 / (2 * alpha));
}

/**
 * Brody–Flemings model with the Clyne–Kurz correction: solid forming at the interface,
 * C_s* = k·C0·[1 − (1 − 2Ωk)·f_s]^((k − 1)/(1 − 2Ωk)), units of c0 (mass %).
 * alpha = 0 gives Scheil, alpha → ∞ gives the lever rule.
 * Source: Brody & Flemings (1966), Clyne & Kurz (1981) [Pub, mem]; science-reference §3.1 check 5.
 */
export function backDiffusionSolidComposition(c0: number, k: number, solidFraction: number, alpha: number): number {
  return k * backDiffusionLiquidComposition(c0, k, solidFraction, alpha);
}

/**
 * Liquid composition of the Brody–Flemings/Clyne–Kurz model, C_L = C_s* ÷ k (units of c0).
 * Rejects f_s = 1 when alpha = 0 (the Scheil limit diverges there).
 * Source: science-reference §3.1.
 */
export function backDiffusionLiquidComposition(c0: number, k: number, solidFraction: number, alpha: number): number {
  checkSegregationInputs(c0, k, solidFraction, true);
  requireNonNegative("alpha (solid Fourier number)", alpha);
  const beta = 2 * clyneKurzOmegaUnchecked(alpha) * k;
  const base = 1 - (1 - beta) * solidFraction;
  if (base <= 0) throw new InputError("solidFraction", solidFraction, "< 1 when alpha = 0 (the Scheil limit diverges)");
  return c0 * Math.pow(base, (k - 1) / (1 - beta));
}

/**
 * Solid-state Fourier number α = D_s·t_f/L² with L = half the secondary dendrite arm spacing
 * (dimensionless). Inputs: diffusivity in the solid (m²/s), local freezing time (s),
 * secondary arm spacing λ2 (µm).
 * Example: C in austenite at 1400 °C, t_f 100 s, λ2 150 µm → α ≈ 8.5 (near lever rule).
 * Source: science-reference §3.1 and the §3.4 back-diffusion example [Computed].
 */
export function fourierNumber(diffusivityM2PerS: number, localFreezingTimeS: number, armSpacingUm: number): number {
  requireNonNegative("diffusivityM2PerS", diffusivityM2PerS);
  requireNonNegative("localFreezingTimeS", localFreezingTimeS);
  requirePositive("armSpacingUm (secondary dendrite arm spacing)", armSpacingUm);
  const halfSpacingM = armSpacingUm * 0.5e-6;
  return (diffusivityM2PerS * localFreezingTimeS) / (halfSpacingM * halfSpacingM);
}
