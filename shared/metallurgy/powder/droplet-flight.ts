import { InputError } from "../errors";
import { requireInRange, requireInteger, requireNonNegative, requirePositive } from "../validate";
import { DROPLET_DEFAULTS, STEFAN_BOLTZMANN_W_PER_M2K4 } from "./droplet-cooling";
import { gasProperties, type AtomisingGas } from "./gas-properties";

const GRAVITY_M_PER_S2 = 9.80665;

/** Inputs of simulateDropletFlight (SI units; temperatures in kelvin). */
export interface DropletFlightParams {
  gas: AtomisingGas;
  /** Droplet diameter, m (0 < d ≤ 1 mm). */
  diameterM: number;
  /** Temperature leaving the atomiser, K (default 1823.15 K = 1550 °C) [App]. */
  initialTempK?: number;
  /** Gas temperature in the tower, K (default 300). */
  gasTempK?: number;
  /** Initial downward speed of the droplet, m/s (default 50) [App]. */
  initialVelocityMPerS?: number;
  /** Downward gas speed, m/s (default 0: still gas) [App]. */
  gasVelocityMPerS?: number;
  /** Nucleation undercooling ΔT_n below the freezing temperature, K (default 50) [Mem/App]. */
  nucleationUndercoolingK?: number;
  freezingTempK?: number;
  liquidDensityKgPerM3?: number;
  liquidHeatCapacityJPerKgK?: number;
  latentHeatJPerKg?: number;
  /** Emissivity 0–1 (default 0.35) [Mem]. */
  emissivity?: number;
  /** Simulated flight time, s (default 2). */
  durationS?: number;
  /** Number of evenly spaced output samples including t = 0 (default 200). */
  samples?: number;
}

/** Sampled flight history returned by simulateDropletFlight (arrays share the time base timeS). */
export interface DropletFlight {
  timeS: Float64Array;
  /** Distance fallen below the atomiser, m. */
  fallM: Float64Array;
  /** Downward droplet speed, m/s. */
  velocityMPerS: Float64Array;
  tempK: Float64Array;
  solidFraction: Float64Array;
  /** Time of nucleation, s (−1 if it did not happen within durationS). */
  nucleationTimeS: number;
  /** Time the droplet is fully solid, s (−1 if not within durationS). */
  solidificationEndTimeS: number;
  /** Mean liquid cooling rate from the start to nucleation, K/s (0 if no nucleation). */
  liquidCoolingRateKPerS: number;
  warnings: string[];
}

/**
 * Flight and thermal history of one droplet in the atomising tower (for the animation):
 * gravity plus Schiller–Naumann drag (C_D = 24/Re·(1 + 0.15Re^0.687), 0.44 above Re 1000),
 * Ranz–Marshall convection and optional radiation at the film temperature, liquid undercooling
 * to T_f − ΔT_n, recalescence (a fraction c·ΔT_n/L_f freezes at once and the droplet returns
 * to T_f), isothermal freezing, then cooling of the solid. Exponential integrators (stable for
 * any step), step 1/50 of the fastest time constant (at most 2e5 steps); deterministic.
 * Sample many droplet sizes with sampleDropletDiametersM (seeded) for a population.
 * Source: science-reference §4.2 (cooling and undercooling model) [App integration];
 * Schiller & Naumann (1933) drag [Pub, mem].
 */
export function simulateDropletFlight(params: DropletFlightParams): DropletFlight {
  if (params === null || typeof params !== "object") throw new InputError("params", params, "a DropletFlightParams object");
  const d = requireInRange("diameterM", params.diameterM, { min: 0, minExclusive: true, max: 1e-3 });
  const tg = requireInRange("gasTempK", params.gasTempK ?? 300, { min: 300, max: 1500 });
  const t0 = requireInRange("initialTempK", params.initialTempK ?? 1823.15, { min: tg, minExclusive: true, max: 2500 });
  const tfreeze = requireInRange("freezingTempK", params.freezingTempK ?? DROPLET_DEFAULTS.freezingTempK, { min: tg, minExclusive: true, max: t0 });
  const undercooling = requireInRange("nucleationUndercoolingK", params.nucleationUndercoolingK ?? 50, { min: 0, max: Math.min(400, tfreeze - tg) });
  const v0 = requireInRange("initialVelocityMPerS", params.initialVelocityMPerS ?? 50, { min: -500, max: 500 });
  const vg = requireInRange("gasVelocityMPerS", params.gasVelocityMPerS ?? 0, { min: -500, max: 500 });
  const rho = requirePositive("liquidDensityKgPerM3", params.liquidDensityKgPerM3 ?? DROPLET_DEFAULTS.liquidDensityKgPerM3);
  const c = requirePositive("liquidHeatCapacityJPerKgK", params.liquidHeatCapacityJPerKgK ?? DROPLET_DEFAULTS.liquidHeatCapacityJPerKgK);
  const lf = requireNonNegative("latentHeatJPerKg", params.latentHeatJPerKg ?? DROPLET_DEFAULTS.latentHeatJPerKg);
  const eps = requireInRange("emissivity", params.emissivity ?? 0.35, { min: 0, max: 1 });
  const duration = requireInRange("durationS", params.durationS ?? 2, { min: 0, minExclusive: true, max: 600 });
  const nSamples = requireInteger("samples", params.samples ?? 200, { min: 2, max: 100000 });
  if (params.gas !== "N2" && params.gas !== "Ar") throw new InputError("gas", params.gas, "one of N2, Ar");

  const out: DropletFlight = {
    timeS: new Float64Array(nSamples),
    fallM: new Float64Array(nSamples),
    velocityMPerS: new Float64Array(nSamples),
    tempK: new Float64Array(nSamples),
    solidFraction: new Float64Array(nSamples),
    nucleationTimeS: -1,
    solidificationEndTimeS: -1,
    liquidCoolingRateKPerS: 0,
    warnings: [],
  };

  // Exponential updates (exact for frozen coefficients) keep the integration stable for any
  // step: 1/50 of the fastest time constant while liquid or freezing, then sample-sized steps.
  const sampleEvery = duration / (nSamples - 1);
  const nucleationTempK = tfreeze - undercooling;
  const maxSteps = 5_000_000;

  let t = 0;
  let z = 0;
  let v = v0;
  let temp = t0;
  let fs = 0;
  let nucleated = false;
  const record = (k: number) => {
    out.timeS[k] = k * sampleEvery;
    out.fallM[k] = z;
    out.velocityMPerS[k] = v;
    out.tempK[k] = temp;
    out.solidFraction[k] = fs;
  };
  record(0);
  let nextSample = 1;
  let steps = 0;
  while (nextSample < nSamples && steps++ < maxSteps) {
    const film = 0.5 * (temp + tg);
    const gas = gasProperties(params.gas, Math.min(2000, Math.max(300, film)));
    const urel = v - vg;
    const re = (gas.densityKgPerM3 * Math.abs(urel) * d) / gas.viscosityPaS;
    const dragFactor = re < 1000 ? 1 + 0.15 * Math.pow(re, 0.687) : (0.44 * re) / 24;
    const tauV = (rho * d * d) / (18 * gas.viscosityPaS * dragFactor);
    const nu = 2 + 0.6 * Math.sqrt(re) * Math.cbrt(gas.prandtl);
    const h = (nu * gas.conductivityWPerMK) / d + eps * STEFAN_BOLTZMANN_W_PER_M2K4 * (temp * temp + tg * tg) * (temp + tg);
    const tauT = (rho * c * d) / (6 * h);
    const toNext = nextSample * sampleEvery - t;
    const settled = nucleated && fs >= 1;
    const dt = settled ? toNext : Math.min(Math.min(tauT, tauV) / 50, toNext);

    const terminal = GRAVITY_M_PER_S2 * tauV;
    const vNew = vg + terminal + (urel - terminal) * Math.exp(-dt / tauV);
    z += 0.5 * (v + vNew) * dt;
    v = vNew;
    if (!nucleated || fs >= 1) {
      temp = tg + (temp - tg) * Math.exp(-dt / tauT);
      if (!nucleated && temp <= nucleationTempK) {
        nucleated = true;
        temp = nucleationTempK;
        out.nucleationTimeS = t + dt;
        out.liquidCoolingRateKPerS = (t0 - temp) / (t + dt);
        // Recalescence: the sensible heat of the undercooling freezes a fraction at once.
        const recalescent = lf > 0 ? (c * undercooling) / lf : Infinity;
        if (recalescent < 1) {
          fs = recalescent;
          temp = tfreeze;
        } else {
          fs = 1;
          temp += lf / c;
          out.solidificationEndTimeS = t + dt;
        }
      }
    } else {
      fs += ((6 * h * (temp - tg)) / (rho * d * lf)) * dt;
      if (fs >= 1) {
        fs = 1;
        out.solidificationEndTimeS = t + dt;
      }
    }
    t += dt;
    if (t >= nextSample * sampleEvery - 1e-12 * duration) {
      t = nextSample * sampleEvery;
      record(nextSample);
      nextSample++;
    }
  }
  if (nextSample < nSamples) {
    out.warnings.push("Step budget exhausted; the remaining samples repeat the last state.");
    for (let k = nextSample; k < nSamples; k++) record(k);
  }
  if (!nucleated) out.warnings.push("The droplet did not reach the nucleation temperature within durationS.");
  else if (out.solidificationEndTimeS < 0) out.warnings.push("The droplet was still freezing at the end of durationS.");
  if (d > 500e-6) out.warnings.push(`Diameter ${(d * 1e6).toPrecision(3)} µm is above 500 µm: coarse for gas atomisation.`);
  return out;
}
