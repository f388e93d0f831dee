import { austeniteDiffusivityM2PerS, lswMeanRadius, type CarbideType } from "../../metallurgy";
import { COARSENING_SOLUTE, INITIAL_MEAN_RADIUS_UM, LSW_RATE_AT_1000C_UM3_PER_H } from "./constants";

/**
 * LSW rate constant of a carbide type at tempC, µm³/h: k ∝ D of its slowest metal solute in austenite
 * (core diffusion data, science-reference §2.5), scaled so a Cr-controlled carbide has the [App] value
 * LSW_RATE_AT_1000C_UM3_PER_H at 1000 °C.
 */
export function lswRateUm3PerH(type: CarbideType, tempC: number): number {
  const ratio = austeniteDiffusivityM2PerS(COARSENING_SOLUTE[type], tempC) / austeniteDiffusivityM2PerS("Cr", 1000);
  return LSW_RATE_AT_1000C_UM3_PER_H * ratio;
}

/** Mean section radius (µm) of a carbide type after `hours` at tempC, by the core's LSW law r̄³ = r̄0³ + k·t. */
export function coarsenedMeanRadiusUm(type: CarbideType, tempC: number, hours: number): number {
  return lswMeanRadius(INITIAL_MEAN_RADIUS_UM[type], lswRateUm3PerH(type, tempC), hours);
}

/** Growth factor r̄(t)/r̄0 of each carbide type. */
export function growthFactors(types: readonly CarbideType[], tempC: number, hours: number): Partial<Record<CarbideType, number>> {
  const out: Partial<Record<CarbideType, number>> = {};
  for (const t of types) out[t] = coarsenedMeanRadiusUm(t, tempC, hours) / INITIAL_MEAN_RADIUS_UM[t];
  return out;
}
