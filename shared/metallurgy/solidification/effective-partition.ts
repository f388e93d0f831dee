import { requireInRange, requireNonNegative, requirePositive } from "../validate";

/**
 * Burton–Prim–Slichter effective partition coefficient at a moving front with a solute
 * boundary layer: k_eff = k / (k + (1 − k)·exp(−V·δ/D_L)) (dimensionless).
 * δ = 0 (perfect mixing) gives k; V·δ/D_L → ∞ (no mixing) gives 1. The ingot simulation
 * uses it as its "liquid mixing" control. boundaryLayerM may be Infinity.
 * Source: Burton, Prim & Slichter (1953), J. Chem. Phys. 21, 1987 [Pub, mem].
 */
export function effectivePartitionCoefficient(
  k: number,
  growthVelocityMPerS: number,
  boundaryLayerM: number,
  liquidDiffusivityM2PerS: number,
): number {
  requireInRange("k (partition coefficient)", k, { min: 0, max: 1, minExclusive: true, maxExclusive: true });
  requireNonNegative("growthVelocityMPerS", growthVelocityMPerS);
  if (!(boundaryLayerM === Infinity)) requireNonNegative("boundaryLayerM", boundaryLayerM);
  requirePositive("liquidDiffusivityM2PerS", liquidDiffusivityM2PerS);
  return effectivePartitionUnchecked(k, growthVelocityMPerS, boundaryLayerM, liquidDiffusivityM2PerS);
}

/** k_eff without validation; V = 0 or δ = 0 gives k (no boundary-layer build-up). */
export function effectivePartitionUnchecked(k: number, velocity: number, boundaryLayer: number, diffusivity: number): number {
  if (velocity === 0 || boundaryLayer === 0) return k;
  const peclet = (velocity * boundaryLayer) / diffusivity;
  return k / (k + (1 - k) * Math.exp(-peclet));
}
