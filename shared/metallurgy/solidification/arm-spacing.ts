import { requirePositive, type WithWarnings } from "../validate";

/**
 * Highest carbon content, mass %, at which the Won & Thomas λ2 fit is used as published.
 * science-reference §3.4 gives the fit's carbon calibration as "warn C > 1.0"; the original
 * paper fits data "measured by several different researchers" (abstract [Checked]) — its data
 * table was not re-checked here.
 */
export const ARM_SPACING_FIT_MAX_CARBON_MASS_PCT = 1.0;

/** Cooling-rate span of the casting data behind the fit, °C/s (science-reference §3.4 [Mem]). */
export const ARM_SPACING_FIT_COOLING_RATE_C_PER_S = { min: 0.01, max: 100 } as const;

/**
 * The warning given when the carbon term is held at its 1 % value. One wording for the core
 * function and the ingot solver, so callers that collect both can de-duplicate it.
 */
export function armSpacingCarbonClampWarning(carbonMassPct: number): string {
  const limit = ARM_SPACING_FIT_MAX_CARBON_MASS_PCT.toFixed(1);
  const ratio = 1 / armSpacingCarbonFactor(carbonMassPct);
  const times = ratio >= 10 ? String(Math.round(ratio)) : ratio.toFixed(1);
  return (
    `C = ${carbonMassPct} % is above ${limit} % C, the calibration limit of the arm-spacing fit (Won & Thomas 2001): ` +
    `its carbon term is held at the ${limit} % value (app choice). Taken literally, the fitted power law would make the ` +
    `dendrites ${times} times finer, an artefact of the fit's form outside its data.`
  );
}

/**
 * Secondary dendrite arm spacing λ2 of steel, µm, from the Won & Thomas (2001) fit:
 * λ2 = (169.1 − 720.9·C)·CR^(−0.4935) for 0 < C ≤ 0.15;
 * λ2 = 143.9·CR^(−0.3616)·C^(0.5501 − 1.996·C) for 0.15 < C ≤ 1.0
 * (CR = cooling rate through the freezing range in °C/s, C in mass %).
 * Above 1.0 % C (the fit's calibration limit, science-reference §3.4) the carbon term is held
 * at its 1.0 % value, λ2 = 143.9·CR^(−0.3616), and a warning says so. Why: the fitted exponent
 * 0.5501 − 1.996·C turns the carbon term over steeply outside the data (at 2.45 % C it is
 * 1/49 of the 1 % value, ≈ 8 µm in a sand-cast ingot), which no measurement supports; holding
 * the boundary value is an [App] choice. The ingot solver uses the same clamped value.
 * Rejects C ≤ 0 and CR ≤ 0; warns for CR > 100 (powder cooling rates: a teaching extrapolation)
 * and CR < 0.01 °C/s (below the casting data).
 * Source: Won & Thomas (2001), Metall. Mater. Trans. A 32, 1755 [Checked]; science-reference §3.4.
 */
export function secondaryArmSpacingUm(coolingRateCPerS: number, carbonMassPct: number): WithWarnings<number> {
  requirePositive("coolingRateCPerS", coolingRateCPerS);
  requirePositive("carbonMassPct", carbonMassPct);
  const warnings: string[] = [];
  const { min, max } = ARM_SPACING_FIT_COOLING_RATE_C_PER_S;
  if (coolingRateCPerS > max) warnings.push(`Cooling rate ${coolingRateCPerS.toPrecision(3)} °C/s is above the casting data (≈${min}–${max} °C/s): a teaching extrapolation.`);
  if (coolingRateCPerS < min) warnings.push(`Cooling rate ${coolingRateCPerS.toPrecision(3)} °C/s is below the casting data (≈${min}–${max} °C/s).`);
  // Kept last: the simulations quote it on its own.
  if (carbonMassPct > ARM_SPACING_FIT_MAX_CARBON_MASS_PCT) warnings.push(armSpacingCarbonClampWarning(carbonMassPct));
  return { value: armSpacingUnchecked(coolingRateCPerS, carbonMassPct), warnings };
}

/** λ2 in µm without validation (inner loops of the ingot solver); carbon above 1 % is clamped as in secondaryArmSpacingUm. */
export function armSpacingUnchecked(coolingRateCPerS: number, carbonMassPct: number): number {
  if (carbonMassPct <= 0.15) return (169.1 - 720.9 * carbonMassPct) * Math.pow(coolingRateCPerS, -0.4935);
  return 143.9 * Math.pow(coolingRateCPerS, -0.3616) * armSpacingCarbonFactor(Math.min(carbonMassPct, ARM_SPACING_FIT_MAX_CARBON_MASS_PCT));
}

/** The fit's carbon term C^(0.5501 − 1.996·C) for C > 0.15 (unclamped). */
function armSpacingCarbonFactor(carbonMassPct: number): number {
  return Math.pow(carbonMassPct, 0.5501 - 1.996 * carbonMassPct);
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
