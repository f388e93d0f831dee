/**
 * Where an ingot is likely to hold coarse primary (eutectic) carbides: a rule on the
 * composition of the last interdendritic liquid, which the core's ingot solver reports at a
 * solid fraction of 0.95. Both thresholds are [App] teaching choices, not published limits:
 *  - vanadium: primary MC is taken to form once the last liquid holds ≥ 12 % V. With k(V) ≈ 0.6
 *    and Scheil-like freezing this triggers from about 3.5–4 % V in the melt — close to the
 *    trade's rule of thumb that conventional casting becomes a problem above 4–5 % V
 *    (common practice, no published source);
 *  - carbon: a eutectic of austenite and carbide is taken to form once the last liquid's carbon
 *    reaches the eutectic value, 4.3 % C for Fe–C (Fe–C diagram) lowered by 0.07 % C per % Cr in
 *    that liquid ([App], a rough linear stand-in for the Fe–Cr–C liquidus valley, from memory).
 * W and Mo (the M6C eutectic of high-speed steels) are not covered.
 */
export const MC_LAST_LIQUID_V_THRESHOLD_MASS_PCT = 12;
export const FE_C_EUTECTIC_CARBON_MASS_PCT = 4.3;
export const EUTECTIC_CARBON_DROP_PER_CR = 0.07;
/** Coarse carbide size taken as 0.3 × λ2 [App], as in science-reference §4.2. */
export const CARBIDE_SIZE_PER_ARM_SPACING = 0.3;

export type CarbideRisk = "none" | "MC" | "eutectic" | "both";

export function eutecticCarbonMassPct(lastLiquidCrMassPct: number): number {
  return Math.max(0.5, FE_C_EUTECTIC_CARBON_MASS_PCT - EUTECTIC_CARBON_DROP_PER_CR * lastLiquidCrMassPct);
}

export function coarseCarbideRisk(lastLiquid: { V?: number; C?: number; Cr?: number }): CarbideRisk {
  const mc = (lastLiquid.V ?? 0) >= MC_LAST_LIQUID_V_THRESHOLD_MASS_PCT;
  const eut = lastLiquid.C !== undefined && lastLiquid.C >= eutecticCarbonMassPct(lastLiquid.Cr ?? 0);
  return mc && eut ? "both" : mc ? "MC" : eut ? "eutectic" : "none";
}

export function carbideSizeUm(armSpacingUm: number): number {
  return CARBIDE_SIZE_PER_ARM_SPACING * armSpacingUm;
}
