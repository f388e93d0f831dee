import { InputError } from "../errors";
import type { RandomSource } from "../random";
import { requireInRange, requireNonNegative, requirePositive } from "../validate";

/** Upper end of the LSW scaled size distribution, ρ = r/r̄ < 3/2. */
export const LSW_MAX_SCALED_RADIUS = 1.5;

/**
 * Mean particle radius under LSW (diffusion-controlled Ostwald ripening): r̄ = (r̄0³ + k·t)^(1/3).
 * Any consistent units, e.g. r0 in µm, rateConstant in µm³/h and time in h give µm.
 * [Pub, mem] Lifshitz & Slyozov (1961), Wagner (1961); science-reference §2.5.
 */
export function lswMeanRadius(r0: number, rateConstant: number, time: number): number {
  requireNonNegative("r0", r0);
  requireNonNegative("rateConstant", rateConstant);
  requireNonNegative("time", time);
  return Math.cbrt(r0 ** 3 + rateConstant * time);
}

/**
 * Steady-state LSW size distribution of the scaled radius ρ = r/r̄ (probability density, 1/ρ units):
 * h(ρ) = (4/9)·ρ²·(3/(3+ρ))^(7/3)·(3/2/(3/2−ρ))^(11/3)·exp(−ρ/(3/2−ρ)) for 0 ≤ ρ < 3/2, else 0.
 * Integrates to 1 with mean 1 and mode ≈ 1.1346. [Pub, mem; verified numerically] science-reference §2.5.
 */
export function lswDistribution(rho: number): number {
  requireNonNegative("rho", rho);
  if (rho >= LSW_MAX_SCALED_RADIUS) return 0;
  const gap = LSW_MAX_SCALED_RADIUS - rho;
  return (
    (4 / 9) *
    rho * rho *
    Math.pow(3 / (3 + rho), 7 / 3) *
    Math.pow(LSW_MAX_SCALED_RADIUS / gap, 11 / 3) *
    Math.exp(-rho / gap)
  );
}

export interface LswRateConstantInput {
  /** Interface energy γ, J/m². */
  interfaceEnergyJPerM2: number;
  /** Equilibrium solubility c∞ of the solute in the matrix, mol/m³. */
  solubilityMolPerM3: number;
  /** Diffusivity D of the rate-controlling solute, m²/s. */
  diffusivityM2PerS: number;
  /** Molar volume V_m of the particle phase, m³/mol (per mole of solute). */
  molarVolumeM3PerMol: number;
  tempC: number;
}

const R_J_PER_MOL_K = 8.314462618; // CODATA

/**
 * LSW rate constant for volume diffusion, k = 8·γ·c∞·D·V_m² / (9·R·T), in m³/s (r̄³ − r̄0³ = k·t).
 * [Pub, mem] science-reference §2.5.
 */
export function lswRateConstantM3PerS(input: LswRateConstantInput): number {
  const gamma = requirePositive("interfaceEnergyJPerM2", input.interfaceEnergyJPerM2);
  const c = requireNonNegative("solubilityMolPerM3", input.solubilityMolPerM3);
  const d = requireNonNegative("diffusivityM2PerS", input.diffusivityM2PerS);
  const vm = requirePositive("molarVolumeM3PerMol", input.molarVolumeM3PerMol);
  const tK = requireInRange("tempC", input.tempC, { min: -273.15, minExclusive: true }) + 273.15;
  return (8 * gamma * c * d * vm * vm) / (9 * R_J_PER_MOL_K * tK);
}

let cdfTable: { rho: Float64Array; cdf: Float64Array } | undefined;

/** Cumulative LSW distribution on a fine grid (trapezoid rule), normalised to end at exactly 1. */
function lswCdfTable(): { rho: Float64Array; cdf: Float64Array } {
  if (cdfTable) return cdfTable;
  const n = 3000;
  const rho = new Float64Array(n + 1);
  const cdf = new Float64Array(n + 1);
  let prev = 0;
  for (let i = 1; i <= n; i++) {
    rho[i] = (LSW_MAX_SCALED_RADIUS * i) / n;
    const h = lswDistribution(rho[i]);
    cdf[i] = cdf[i - 1] + 0.5 * (prev + h) * (rho[i] - rho[i - 1]);
    prev = h;
  }
  for (let i = 0; i <= n; i++) cdf[i] /= cdf[n];
  cdfTable = { rho, cdf };
  return cdfTable;
}

/** Draws a scaled radius ρ = r/r̄ from the LSW distribution by inverting its tabulated CDF. */
export function sampleLswScaledRadius(random: RandomSource): number {
  if (typeof random !== "function") throw new InputError("random", random, "a seeded random source (createRandom)");
  const { rho, cdf } = lswCdfTable();
  const u = random();
  let lo = 0;
  let hi = cdf.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (cdf[mid] < u) lo = mid;
    else hi = mid;
  }
  const span = cdf[hi] - cdf[lo];
  const t = span > 0 ? (u - cdf[lo]) / span : 0;
  return rho[lo] + t * (rho[hi] - rho[lo]);
}
