/**
 * Secondary dendrite arm spacing for display in the ingot and powder simulations, from the
 * core's Won & Thomas (2001) fit. Above the fit's 1 % C calibration limit the core itself holds
 * the carbon term at its 1 % value and says so in a warning (its last one), so a high-carbon
 * tool steel no longer shows unphysically fine dendrites; the ingot solver's back-diffusion
 * uses the same clamped value.
 */
import { ARM_SPACING_FIT_MAX_CARBON_MASS_PCT, secondaryArmSpacingUm } from "../../metallurgy/solidification/arm-spacing";

export const ARM_SPACING_CARBON_CAP_MASS_PCT = ARM_SPACING_FIT_MAX_CARBON_MASS_PCT;

export interface DisplayArmSpacing {
  valueUm: number;
  carbonCapped: boolean;
  warnings: string[];
}

/** λ2 in µm for a cooling rate (°C/s) and carbon content; null without carbon or cooling. */
export function displayArmSpacingUm(coolingRateCPerS: number, carbonMassPct: number): DisplayArmSpacing | null {
  if (!(coolingRateCPerS > 0) || !(carbonMassPct > 0)) return null;
  const r = secondaryArmSpacingUm(coolingRateCPerS, carbonMassPct);
  return { valueUm: r.value, carbonCapped: carbonMassPct > ARM_SPACING_CARBON_CAP_MASS_PCT, warnings: r.warnings };
}
