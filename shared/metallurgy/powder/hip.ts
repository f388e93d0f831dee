import { requireInRange, requirePositive } from "../validate";

/** Inputs of hipRelativeDensity. */
export interface HipInput {
  /** Relative (tap) density of the canned powder D0, 0 < D0 < 1 (typically 0.62–0.68 [Mem]). */
  initialDensity: number;
  /** Isostatic gas pressure, MPa (typically 100–200 [Trade]). */
  pressureMPa: number;
  /** Yield strength of the powder at HIP temperature, MPa (austenite ≈ 20–50 at 1150 °C [Mem]). */
  yieldStrengthMPa: number;
}

/** Result of hipRelativeDensity. */
export interface HipResult {
  /** Yield-limited relative density reached (dimensionless). */
  relativeDensity: number;
  /** 1 = isolated necks (D < 0.9), 2 = isolated pores. */
  stage: 1 | 2;
  /** Stage-1 formula value (may exceed 1; it decides the switch to stage 2). */
  stage1Density: number;
  warnings: string[];
}

/**
 * Yield-limited density after hot isostatic pressing (HIP-map approach):
 * stage 1 D = [(1 − D0)·P/(1.3σ_y) + D0³]^(1/3); if that reaches ≥ 0.9 the pores are isolated
 * and stage 2 D = 1 − exp(−3P/(2σ_y)) applies. The remaining porosity is closed by creep and
 * diffusion, which v1 does not model [App]. Densification never goes backwards: stage 2 is
 * floored at max(0.9, D0) with a warning.
 * Example: D0 0.64, P 100 MPa, σ_y 30 MPa → stage 2, D = 0.99326.
 * Rejects D0 ∉ (0, 1), P ≤ 0, σ_y ≤ 0.
 * Source: Helle, Easterling & Ashby (1985), Acta Metall. 33, 2163 [Pub, mem — verify constants];
 * science-reference §4.3.
 */
export function hipRelativeDensity(input: HipInput): HipResult {
  const d0 = requireInRange("initialDensity", input.initialDensity, { min: 0, max: 1, minExclusive: true, maxExclusive: true });
  const p = requirePositive("pressureMPa", input.pressureMPa);
  const sy = requirePositive("yieldStrengthMPa", input.yieldStrengthMPa);
  const stage1Density = Math.cbrt(((1 - d0) * p) / (1.3 * sy) + d0 * d0 * d0);
  const warnings: string[] = [];
  if (stage1Density < 0.9) return { relativeDensity: stage1Density, stage: 1, stage1Density, warnings };
  const stage2 = -Math.expm1((-3 * p) / (2 * sy));
  const floor = Math.max(0.9, d0);
  if (stage2 < floor) {
    warnings.push("The stage-2 formula gives less than the density already reached; the density is held at the stage boundary.");
  }
  return { relativeDensity: Math.max(stage2, floor), stage: 2, stage1Density, warnings };
}

/**
 * Isotropic linear shrinkage of a HIP can from mass conservation, 1 − (D0/D_f)^(1/3), as a
 * fraction (0.1566 = 15.66 %). finalDensity defaults to 1 (full density); D0 ≤ D_f ≤ 1.
 * Source: science-reference §4.3 check 4 [Computed].
 */
export function hipLinearShrinkage(initialDensity: number, finalDensity = 1): number {
  const d0 = requireInRange("initialDensity", initialDensity, { min: 0, max: 1, minExclusive: true, maxExclusive: true });
  const df = requireInRange("finalDensity", finalDensity, { min: d0, max: 1 });
  return 1 - Math.cbrt(d0 / df);
}
