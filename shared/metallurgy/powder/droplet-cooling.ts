import { InputError } from "../errors";
import { checkRange } from "./fast-range";
import { gasPropertiesInto, type AtomisingGas, type GasProperties } from "./gas-properties";

/** Stefan–Boltzmann constant, W/(m²·K⁴) (CODATA 2018, exact). */
export const STEFAN_BOLTZMANN_W_PER_M2K4 = 5.670374419e-8;

/**
 * Liquid/solid steel defaults for droplet cooling (science-reference §4.2, all [Mem]):
 * ρ 7000 kg/m³ (liquid Fe ≈ 7000–7030 at T_m), c 800 J/(kg·K) (liquid Fe ≈ 46 J/(mol·K)),
 * k_s 30 W/(m·K), L_f 2.7e5 J/kg, freezing at 1480 °C; emissivity 0 (radiation off) so that
 * the convective check values hold — the reference suggests ε 0.3–0.4 when radiation is wanted.
 */
export const DROPLET_DEFAULTS = Object.freeze({
  liquidDensityKgPerM3: 7000,
  liquidHeatCapacityJPerKgK: 800,
  solidConductivityWPerMK: 30,
  latentHeatJPerKg: 2.7e5,
  freezingTempK: 1753.15,
  emissivity: 0,
});

/** Reused by dropletCooling so a call allocates only its result (values are copied out). */
const scratchGas: GasProperties = { densityKgPerM3: 0, heatCapacityJPerKgK: 0, conductivityWPerMK: 0, viscosityPaS: 0, prandtl: 0 };

/** Inputs of dropletCooling (SI units; temperatures in kelvin). */
export interface DropletCoolingInput {
  gas: AtomisingGas;
  /** Droplet diameter, m (0 < d ≤ 1 mm; warns below 1 µm and above 500 µm). */
  diameterM: number;
  /** Droplet speed relative to the gas, m/s (≥ 0). */
  relativeVelocityMPerS: number;
  /** Droplet temperature, K (> gasTempK). */
  dropletTempK: number;
  /** Gas temperature, K. The film temperature (T_d + T_g)/2 must lie in 300–2000 K. */
  gasTempK: number;
  liquidDensityKgPerM3?: number;
  liquidHeatCapacityJPerKgK?: number;
  solidConductivityWPerMK?: number;
  latentHeatJPerKg?: number;
  /** Temperature of isothermal freezing, K (default 1753.15 K = 1480 °C). */
  freezingTempK?: number;
  /** Surface emissivity 0–1 (default 0: convection only). */
  emissivity?: number;
}

/** Result of dropletCooling (SI units). */
export interface DropletCoolingResult {
  /** Re = ρ_g·v·d/µ_g at the film temperature. */
  reynolds: number;
  prandtl: number;
  /** Ranz–Marshall Nu = 2 + 0.6·Re^½·Pr^⅓. */
  nusselt: number;
  /** Convective coefficient h = Nu·k_g/d, W/(m²·K). */
  heatTransferWPerM2K: number;
  /** Radiative coefficient εσ(T_d² + T_g²)(T_d + T_g), W/(m²·K) (0 when emissivity is 0). */
  radiativeHeatTransferWPerM2K: number;
  /** Liquid cooling rate 6(h + h_r)(T_d − T_g)/(ρ·c·d), K/s. */
  coolingRateKPerS: number;
  /** Bi = (h + h_r)·(d/6)/k_s; the lumped model needs Bi < 0.1. */
  biot: number;
  /** Isothermal freezing time ρ·L_f·d/(6(h + h_r,f)(T_f − T_g)), s. */
  freezeTimeS: number;
  filmTempK: number;
  warnings: string[];
}

/**
 * Cooling of a gas-atomised steel droplet: lumped capacitance with the Ranz–Marshall
 * correlation, gas properties at the film temperature (T_d + T_g)/2.
 * Example: N2, d 50 µm, v 20 m/s, T_d 1773.15 K, T_g 300 K → h 4715 W/m²K, 1.488e5 K/s.
 * Rejects d ≤ 0 or > 1 mm, v < 0, T_d ≤ T_g, film outside 300–2000 K; warns for Bi > 0.1,
 * Re > 1e4, d > 500 µm or < 1 µm.
 * Source: Ranz & Marshall (1952), Chem. Eng. Prog. 48 [Pub, mem; Checked]; science-reference §4.2.
 */
export function dropletCooling(input: DropletCoolingInput): DropletCoolingResult {
  if (input === null || typeof input !== "object") throw new InputError("input", input, "a DropletCoolingInput object");
  // Plain comparisons on the hot path (the simulations evaluate thousands of droplets per frame).
  const d = checkRange("diameterM", input.diameterM, 0, 1e-3, true);
  const v = checkRange("relativeVelocityMPerS", input.relativeVelocityMPerS, 0, 1000);
  const tg = checkRange("gasTempK", input.gasTempK, 0, Infinity, true);
  const td = checkRange("dropletTempK", input.dropletTempK, tg, 3500, true);
  const rho = checkRange("liquidDensityKgPerM3", input.liquidDensityKgPerM3 ?? DROPLET_DEFAULTS.liquidDensityKgPerM3, 0, Infinity, true, true);
  const c = checkRange("liquidHeatCapacityJPerKgK", input.liquidHeatCapacityJPerKgK ?? DROPLET_DEFAULTS.liquidHeatCapacityJPerKgK, 0, Infinity, true, true);
  const ks = checkRange("solidConductivityWPerMK", input.solidConductivityWPerMK ?? DROPLET_DEFAULTS.solidConductivityWPerMK, 0, Infinity, true, true);
  const lf = checkRange("latentHeatJPerKg", input.latentHeatJPerKg ?? DROPLET_DEFAULTS.latentHeatJPerKg, 0, Infinity, false, true);
  const tf = checkRange("freezingTempK", input.freezingTempK ?? DROPLET_DEFAULTS.freezingTempK, tg, 3500, true);
  const eps = checkRange("emissivity", input.emissivity ?? DROPLET_DEFAULTS.emissivity, 0, 1);

  const filmTempK = 0.5 * (td + tg);
  const gas = gasPropertiesInto(input.gas, filmTempK, "film temperature (dropletTempK + gasTempK)/2", scratchGas);
  const reynolds = (gas.densityKgPerM3 * v * d) / gas.viscosityPaS;
  const nusselt = 2 + 0.6 * Math.sqrt(reynolds) * Math.cbrt(gas.prandtl);
  const h = (nusselt * gas.conductivityWPerMK) / d;
  const hr = eps * STEFAN_BOLTZMANN_W_PER_M2K4 * (td * td + tg * tg) * (td + tg);
  const hrFreeze = eps * STEFAN_BOLTZMANN_W_PER_M2K4 * (tf * tf + tg * tg) * (tf + tg);
  const coolingRateKPerS = (6 * (h + hr) * (td - tg)) / (rho * c * d);
  const biot = ((h + hr) * d) / 6 / ks;
  const freezeTimeS = (rho * lf * d) / (6 * (h + hrFreeze) * (tf - tg));

  const warnings: string[] = [];
  if (biot > 0.1) warnings.push(`Biot number ${biot.toPrecision(3)} > 0.1: the droplet is not isothermal and the lumped model overestimates cooling.`);
  if (reynolds > 1e4) warnings.push(`Re = ${reynolds.toPrecision(3)} is above the Ranz–Marshall correlation range (≲ 1e4).`);
  if (d > 500e-6) warnings.push(`Diameter ${(d * 1e6).toPrecision(3)} µm is above 500 µm: coarse for gas atomisation.`);
  if (d < 1e-6) warnings.push(`Diameter ${(d * 1e6).toPrecision(3)} µm is below 1 µm: outside the 1–1000 µm range of the model.`);
  return {
    reynolds,
    prandtl: gas.prandtl,
    nusselt,
    heatTransferWPerM2K: h,
    radiativeHeatTransferWPerM2K: hr,
    coolingRateKPerS,
    biot,
    freezeTimeS,
    filmTempK,
    warnings,
  };
}
