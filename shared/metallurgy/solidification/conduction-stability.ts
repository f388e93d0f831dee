import { requireInRange, requireNonNegative, requirePositive } from "../validate";

/** Inputs of explicitStableTimeStepS (SI units). */
export interface ExplicitStabilityInput {
  /** Thermal diffusivity α = k/(ρc), m²/s (use the plain c: c_eff does not relax the limit). */
  diffusivityM2PerS: number;
  /** Node spacing Δx, m. */
  cellSizeM: number;
  /** Convective coefficient of a boundary node, W/(m²·K); omit for interior nodes. */
  heatTransferWPerM2K?: number;
  /** Conductivity k, W/(m·K); needed with heatTransferWPerM2K for Bi = hΔx/k. */
  conductivityWPerMK?: number;
}

/**
 * Largest stable explicit (FTCS) time step, s: interior Fo = αΔt/Δx² ≤ ½, convective boundary
 * node Fo·(1 + Bi) ≤ ½ with Bi = hΔx/k.
 * Example: α 5.962e-6 m²/s, Δx 5 mm → 2.097 s; with h 1000 W/m²K, k 30 → 1.797 s.
 * Source: Incropera & DeWitt, finite-difference stability criteria [Pub, mem]; science-reference §3.6 check 3.
 */
export function explicitStableTimeStepS(input: ExplicitStabilityInput): number {
  const alpha = requirePositive("diffusivityM2PerS", input.diffusivityM2PerS);
  const dx = requirePositive("cellSizeM", input.cellSizeM);
  let biot = 0;
  if (input.heatTransferWPerM2K !== undefined) {
    const h = requireNonNegative("heatTransferWPerM2K", input.heatTransferWPerM2K);
    const k = requirePositive("conductivityWPerMK", input.conductivityWPerMK ?? Number.NaN);
    biot = (h * dx) / k;
  }
  return (dx * dx) / (2 * alpha * (1 + biot));
}

/**
 * Effective heat capacity inside the freezing range, c_eff = c + L_f/(T_L − T_S), J/(kg·K).
 * Rejects T_L ≤ T_S (use the enthalpy method for isothermal freezing).
 * Example: c 680, L_f 2.7e5, T_L 1450, T_S 1350 → 3380 J/(kg·K).
 * Source: science-reference §3.6 check 4.
 */
export function effectiveHeatCapacityJPerKgK(heatCapacityJPerKgK: number, latentHeatJPerKg: number, liquidusC: number, solidusC: number): number {
  requirePositive("heatCapacityJPerKgK", heatCapacityJPerKgK);
  requireNonNegative("latentHeatJPerKg", latentHeatJPerKg);
  requireInRange("liquidusC", liquidusC);
  requireInRange("solidusC", solidusC, { max: liquidusC, maxExclusive: true });
  return heatCapacityJPerKgK + latentHeatJPerKg / (liquidusC - solidusC);
}
