/**
 * The powder divided into size classes, and for each class the flight and freezing of a
 * droplet of that size through the atomising tower (the core's simulateDropletFlight), its
 * cooling rate, secondary dendrite arm spacing and carbide size. Pure; run in a worker.
 */
import { simulateDropletFlight, type DropletFlight } from "../../metallurgy/powder/droplet-flight";
import { dropletCooling } from "../../metallurgy/powder/droplet-cooling";
import { sizeClassMassFractions } from "../../metallurgy/powder/lognormal";
import { liquidusTempC, solidusTempC } from "../../metallurgy/solidification/liquidus-solidus";
import { backDiffusionLiquidComposition, fourierNumber } from "../../metallurgy/solidification/back-diffusion";
import { PARTITION_DATA } from "../../metallurgy/solidification/partition-data";
import { soluteDiffusivityInSolidM2PerS } from "../../metallurgy/solidification/solid-diffusion";
import type { Composition } from "../../metallurgy/composition";
import { displayArmSpacingUm } from "../ingot/arm-spacing";
import { carbideSizeUm } from "../ingot/carbide-risk";
import type { ResolvedPowderParams } from "./params";

export const CLASS_COUNT = 14;
/** Gas in the tower, K [App]: room-temperature nitrogen or argon (the real gas warms up). */
export const GAS_TEMP_K = 300;
/** Speed of the melt stream leaving the nozzle, m/s [App]. */
export const MELT_STREAM_SPEED_M_PER_S = 5;
/** Solid fraction at which the last liquid's composition is reported (as in the ingot). */
export const REPORT_SOLID_FRACTION = 0.95;
/** Samples per droplet history (enough to interpolate the animation smoothly). */
const SAMPLES = 160;
const SMALLEST_M = 2e-6;
const LARGEST_M = 1e-3;

export interface SizeClass {
  /** Representative (geometric-mean) diameter, m. */
  diameterM: number;
  lowerM: number;
  upperM: number;
  /** Mass fraction of the powder in this class (tails merged into the end classes). */
  massFraction: number;
}

export interface ClassResult extends SizeClass {
  flight: DropletFlight;
  /** Liquid cooling rate from leaving the nozzle to nucleation, K/s (= °C/s). */
  coolingRateKPerS: number;
  /** Cooling rate of the liquid at the liquidus by Ranz–Marshall at the initial slip speed, K/s. */
  liquidusCoolingRateKPerS: number;
  /** Time from nucleation to fully solid, s (the droplet's local freezing time). */
  freezingTimeS: number;
  /** Distance below the nozzle where the droplet is fully solid, m (NaN if not within the flight). */
  solidAtFallM: number;
  armSpacingUm: number | null;
  carbideSizeUm: number | null;
  /** Last interdendritic liquid (f_s 0.95) per element, mass %. */
  lastLiquidMassPct: Partial<Record<"C" | "V" | "Cr" | "Mo", number>>;
  warnings: string[];
}

export interface PowderClasses {
  classes: ClassResult[];
  liquidusC: number;
  solidusC: number;
  initialTempC: number;
  nucleationTempC: number;
  warnings: string[];
}

/** Log-spaced classes spanning ±2.5 geometric standard deviations around D50 (clamped to 2 µm–1 mm). */
export function sizeClasses(medianDiameterUm: number, geometricStdDev: number, count = CLASS_COUNT): SizeClass[] {
  const d50 = medianDiameterUm * 1e-6;
  const lo = Math.max(SMALLEST_M, d50 / geometricStdDev ** 2.5);
  const hi = Math.min(LARGEST_M, d50 * geometricStdDev ** 2.5);
  const edges: number[] = [];
  for (let i = 0; i <= count; i++) edges.push(lo * (hi / lo) ** (i / count));
  // Inner edges only: the core adds the two tails, which we merge into the end classes.
  const fractions = sizeClassMassFractions(edges.slice(1, -1), d50, geometricStdDev);
  return fractions.map((massFraction, i) => ({
    lowerM: edges[i],
    upperM: edges[i + 1],
    diameterM: Math.sqrt(edges[i] * edges[i + 1]),
    massFraction,
  }));
}

export function computePowderClasses(params: ResolvedPowderParams, onClass?: (done: number, total: number) => void): PowderClasses {
  const comp = params.composition;
  const liquidus = liquidusTempC(comp);
  const solidus = solidusTempC(comp);
  const liquidusK = liquidus.value + 273.15;
  const initialTempK = liquidusK + params.superheatC;
  const warnings = [...new Set([...liquidus.warnings, ...solidus.warnings])];
  const classes = sizeClasses(params.medianDiameterUm, params.geometricStdDev);
  const results: ClassResult[] = [];
  classes.forEach((cls, index) => {
    results.push(computeClass(cls, params, comp, liquidusK, initialTempK, liquidus.value, solidus.value));
    onClass?.(index + 1, classes.length);
  });
  return {
    classes: results,
    liquidusC: liquidus.value,
    solidusC: solidus.value,
    initialTempC: initialTempK - 273.15,
    nucleationTempC: liquidus.value - params.undercoolingK,
    warnings,
  };
}

function computeClass(
  cls: SizeClass,
  params: ResolvedPowderParams,
  comp: Composition,
  liquidusK: number,
  initialTempK: number,
  liquidusC: number,
  solidusC: number,
): ClassResult {
  const slip = Math.abs(params.gasVelocityMPerS - MELT_STREAM_SPEED_M_PER_S);
  const atLiquidus = dropletCooling({ gas: params.gas, diameterM: cls.diameterM, relativeVelocityMPerS: slip, dropletTempK: liquidusK, gasTempK: GAS_TEMP_K, freezingTempK: liquidusK });
  // Fly long enough to see the droplet freeze: estimate with the initial cooling rate, then
  // triple it (the droplet slows down relative to the gas and cools more slowly).
  const estimate = (params.superheatC + params.undercoolingK) / atLiquidus.coolingRateKPerS + atLiquidus.freezeTimeS;
  const durationS = Math.min(20, Math.max(1e-3, 4 * estimate));
  const flight = simulateDropletFlight({
    gas: params.gas,
    diameterM: cls.diameterM,
    initialTempK,
    gasTempK: GAS_TEMP_K,
    initialVelocityMPerS: MELT_STREAM_SPEED_M_PER_S,
    gasVelocityMPerS: params.gasVelocityMPerS,
    nucleationUndercoolingK: Math.min(params.undercoolingK, liquidusK - GAS_TEMP_K - 1),
    freezingTempK: liquidusK,
    durationS,
    samples: SAMPLES,
  });
  const warnings = [...atLiquidus.warnings, ...flight.warnings];
  const coolingRate = flight.liquidCoolingRateKPerS > 0 ? flight.liquidCoolingRateKPerS : atLiquidus.coolingRateKPerS;
  const freezingTimeS = flight.solidificationEndTimeS > 0 && flight.nucleationTimeS >= 0 ? flight.solidificationEndTimeS - flight.nucleationTimeS : NaN;
  const lambda = displayArmSpacingUm(coolingRate, comp.C ?? 0);
  if (lambda) warnings.push(...lambda.warnings);
  const armSpacing = lambda?.valueUm ?? null;
  return {
    ...cls,
    flight,
    coolingRateKPerS: coolingRate,
    liquidusCoolingRateKPerS: atLiquidus.coolingRateKPerS,
    freezingTimeS,
    solidAtFallM: fallAt(flight, flight.solidificationEndTimeS),
    armSpacingUm: armSpacing,
    carbideSizeUm: armSpacing === null ? null : carbideSizeUm(armSpacing),
    lastLiquidMassPct: lastLiquid(comp, freezingTimeS > 0 ? freezingTimeS : (liquidusC - solidusC) / coolingRate, armSpacing, 0.5 * (liquidusC + solidusC)),
    warnings: [...new Set(warnings)],
  };
}

/** Fall distance at time t by interpolating the recorded flight (NaN for t < 0). */
export function fallAt(flight: DropletFlight, timeS: number): number {
  if (!(timeS >= 0)) return NaN;
  const { timeS: ts, fallM } = flight;
  const n = ts.length;
  if (timeS >= ts[n - 1]) return fallM[n - 1];
  const step = ts[1] - ts[0];
  const i = Math.min(n - 2, Math.floor(timeS / step));
  const w = (timeS - ts[i]) / step;
  return fallM[i] + w * (fallM[i + 1] - fallM[i]);
}

/**
 * Liquid between the dendrite arms at 95 % solid, with back-diffusion over half the arm spacing
 * during the droplet's freezing time (Brody–Flemings/Clyne–Kurz from the core). Elements without
 * diffusion data are treated as Scheil (α = 0).
 */
export function lastLiquid(comp: Composition, freezingTimeS: number, armSpacingUm: number | null, midTempC: number): ClassResult["lastLiquidMassPct"] {
  const out: ClassResult["lastLiquidMassPct"] = {};
  for (const el of ["C", "V", "Cr", "Mo"] as const) {
    const c0 = comp[el] ?? 0;
    const datum = PARTITION_DATA[el];
    if (!(c0 > 0) || !datum) continue;
    let alpha = 0;
    if (armSpacingUm && freezingTimeS > 0) {
      const t = Math.min(1600, Math.max(500, midTempC));
      alpha = fourierNumber(soluteDiffusivityInSolidM2PerS(el, t), freezingTimeS, armSpacingUm);
    }
    out[el] = backDiffusionLiquidComposition(c0, datum.kGamma, REPORT_SOLID_FRACTION, alpha);
  }
  return out;
}
