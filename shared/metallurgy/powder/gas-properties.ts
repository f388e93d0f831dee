import { InputError } from "../errors";
import { checkRange } from "./fast-range";
import { GAS_PROPERTIES_1ATM, type AtomisingGas, type GasPropertyRow } from "../data/gas-properties-1atm";

export { GAS_PROPERTIES_1ATM, type AtomisingGas, type GasPropertyRow };

/** Gas properties at one temperature and 1 atm (SI units). */
export interface GasProperties {
  densityKgPerM3: number;
  heatCapacityJPerKgK: number;
  conductivityWPerMK: number;
  viscosityPaS: number;
  /** c_p·µ/k of the interpolated values. */
  prandtl: number;
}

const TABLE: Record<AtomisingGas, GasPropertyRow[]> = {
  N2: GAS_PROPERTIES_1ATM.filter((r) => r.gas === "N2"),
  Ar: GAS_PROPERTIES_1ATM.filter((r) => r.gas === "Ar"),
};
const MIN_K = 300;
const MAX_K = 2000;
const STEP_K = 100;

/**
 * Properties of nitrogen or argon at 1 atm and tempK (300–2000 K; rejected outside), by
 * linear interpolation of the 100 K table in T. Density is interpolated as ρ·T (an ideal gas
 * has ρ ∝ 1/T; plain linear interpolation of ρ is 0.2 % off mid-interval, linear ρ·T agrees
 * with the reference equation to 1e-5). Prandtl = c_p·µ/k of the interpolated values.
 * Source: GAS_PROPERTIES_1ATM [Computed: NIST equations via CoolProp]; science-reference §4.2.
 */
export function gasProperties(gas: AtomisingGas, tempK: number): GasProperties {
  return gasPropertiesNamed(gas, tempK, "tempK");
}

/** gasProperties with the parameter name used in the InputError (e.g. the film temperature). */
export function gasPropertiesNamed(gas: AtomisingGas, tempK: number, parameter: string): GasProperties {
  const out: GasProperties = { densityKgPerM3: 0, heatCapacityJPerKgK: 0, conductivityWPerMK: 0, viscosityPaS: 0, prandtl: 0 };
  return gasPropertiesInto(gas, tempK, parameter, out);
}

/**
 * Writes the interpolated properties into `out` (no allocation; for hot loops) and returns it.
 * Same validation and interpolation as gasProperties.
 */
export function gasPropertiesInto(gas: AtomisingGas, tempK: number, parameter: string, out: GasProperties): GasProperties {
  if (gas !== "N2" && gas !== "Ar") throw new InputError("gas", gas, "one of N2, Ar");
  checkRange(parameter, tempK, MIN_K, MAX_K);
  const rows = TABLE[gas];
  const j = Math.min(Math.floor((tempK - MIN_K) / STEP_K), rows.length - 2);
  const a = rows[j];
  const b = rows[j + 1];
  const f = (tempK - a.tempK) / (b.tempK - a.tempK);
  const cp = a.heatCapacityJPerKgK + f * (b.heatCapacityJPerKgK - a.heatCapacityJPerKgK);
  const k = a.conductivityWPerMK + f * (b.conductivityWPerMK - a.conductivityWPerMK);
  const mu = a.viscosityPaS + f * (b.viscosityPaS - a.viscosityPaS);
  const rhoTa = a.densityKgPerM3 * a.tempK;
  out.densityKgPerM3 = (rhoTa + f * (b.densityKgPerM3 * b.tempK - rhoTa)) / tempK;
  out.heatCapacityJPerKgK = cp;
  out.conductivityWPerMK = k;
  out.viscosityPaS = mu;
  out.prandtl = (cp * mu) / k;
  return out;
}
