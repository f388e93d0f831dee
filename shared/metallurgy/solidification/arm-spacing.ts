import { requirePositive, type WithWarnings } from "../validate";

/**
 * Secondary dendrite arm spacing λ2 of steel, µm, from the Won & Thomas (2001) fit:
 * λ2 = (169.1 − 720.9·C)·CR^(−0.4935) for 0 < C ≤ 0.15;
 * λ2 = 143.9·CR^(−0.3616)·C^(0.5501 − 1.996·C) for C > 0.15
 * (CR = cooling rate through the freezing range in °C/s, C in mass %).
 * Rejects C ≤ 0 and CR ≤ 0; warns for C > 1.0, CR > 100 (powder cooling rates: a teaching
 * extrapolation) and CR < 0.01 °C/s (below the casting data).
 * Source: Won & Thomas (2001), Metall. Mater. Trans. A 32, 1755 [Checked]; science-reference §3.4.
 */
export function secondaryArmSpacingUm(coolingRateCPerS: number, carbonMassPct: number): WithWarnings<number> {
  requirePositive("coolingRateCPerS", coolingRateCPerS);
  requirePositive("carbonMassPct", carbonMassPct);
  const warnings: string[] = [];
  if (carbonMassPct > 1.0) warnings.push(`C = ${carbonMassPct} % is above 1.0 %: the arm-spacing fit is extrapolated.`);
  if (coolingRateCPerS > 100) warnings.push(`Cooling rate ${coolingRateCPerS.toPrecision(3)} °C/s is above the casting data (≈0.01–100 °C/s): a teaching extrapolation.`);
  if (coolingRateCPerS < 0.01) warnings.push(`Cooling rate ${coolingRateCPerS.toPrecision(3)} °C/s is below the casting data (≈0.01–100 °C/s).`);
  return { value: armSpacingUnchecked(coolingRateCPerS, carbonMassPct), warnings };
}

/** λ2 in µm without validation (inner loops of the ingot solver). */
export function armSpacingUnchecked(coolingRateCPerS: number, carbonMassPct: number): number {
  if (carbonMassPct <= 0.15) return (169.1 - 720.9 * carbonMassPct) * Math.pow(coolingRateCPerS, -0.4935);
  return 143.9 * Math.pow(coolingRateCPerS, -0.3616) * Math.pow(carbonMassPct, 0.5501 - 1.996 * carbonMassPct);
}

/**
 * Teaching estimate of the eutectic/primary carbide size from the secondary arm spacing,
 * d_carbide ≈ 0.3·λ2 (µm). It keeps the powder-versus-ingot ratio right: ≈0.5–3 µm carbides in
 * gas-atomised powder against ≈10–40 µm in conventional ingots of the same grade [Mem].
 * Source: science-reference §4.2 [App estimate]; factor user-tunable.
 */
export function eutecticCarbideSizeUm(armSpacingUm: number, factor = 0.3): number {
  requirePositive("armSpacingUm", armSpacingUm);
  requirePositive("factor", factor);
  return factor * armSpacingUm;
}
