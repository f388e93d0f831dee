/**
 * Secondary dendrite arm spacing for display in the ingot and powder simulations, from the
 * core's Won & Thomas (2001) fit. The fit was made on steels up to about 1 % C, and its carbon
 * term turns over above that (at 2.45 % C it gives one fiftieth of the 1 % C value), so a
 * high-carbon tool steel would show unphysically fine dendrites. Above 1 % C we therefore hold
 * the carbon term at its 1 % value — an [App] choice, stated in the UI with the fit's own
 * warnings. The ingot solver's back-diffusion uses the fit unchanged.
 */
import { secondaryArmSpacingUm } from "../../metallurgy/solidification/arm-spacing";

export const ARM_SPACING_CARBON_CAP_MASS_PCT = 1.0;

export interface DisplayArmSpacing {
  valueUm: number;
  carbonCapped: boolean;
  warnings: string[];
}

/** λ2 in µm for a cooling rate (°C/s) and carbon content; null without carbon or cooling. */
export function displayArmSpacingUm(coolingRateCPerS: number, carbonMassPct: number): DisplayArmSpacing | null {
  if (!(coolingRateCPerS > 0) || !(carbonMassPct > 0)) return null;
  const carbonCapped = carbonMassPct > ARM_SPACING_CARBON_CAP_MASS_PCT;
  const r = secondaryArmSpacingUm(coolingRateCPerS, Math.min(carbonMassPct, ARM_SPACING_CARBON_CAP_MASS_PCT));
  const warnings = [...r.warnings];
  if (carbonCapped) {
    warnings.push(
      `C = ${carbonMassPct} % is above the arm-spacing fit's data (≤ 1 % C); its carbon term is held at the 1 % value (app choice).`,
    );
  }
  return { valueUm: r.value, carbonCapped, warnings };
}
