import { InputError } from "../errors";
import type { RandomSource } from "../random";
import { normalDeviate } from "../random";
import { requireInRange, requireInteger, requirePositive } from "../validate";
import { erfc } from "../solidification/erf";

/**
 * Default powder size distribution: mass-median D50 = 80 µm, σg = 2.0 [App]. Gas-atomised
 * tool-steel powders range from D50 ≈ 30–40 µm (close-coupled) to 150–250 µm, σg ≈ 2.0–2.3
 * [Checked: "Atomisation techniques for the formation of metal powders", Woodhead 2013].
 * Source: science-reference §4.1.
 */
export const POWDER_SIZE_DEFAULTS = Object.freeze({ medianDiameterM: 80e-6, geometricStdDev: 2.0 });

function checkDistribution(medianDiameterM: number, geometricStdDev: number): void {
  requirePositive("medianDiameterM", medianDiameterM);
  requireInRange("geometricStdDev", geometricStdDev, { min: 1, minExclusive: true, max: 100 });
}

/** Standard normal cumulative distribution Φ(z) = ½·erfc(−z/√2), accurate in both tails. */
export function standardNormalCdf(z: number): number {
  return 0.5 * erfc(-z / Math.SQRT2);
}

/**
 * Mass fraction of a log-normal powder finer than diameter d: F(d) = Φ(ln(d/D50)/ln σg)
 * (dimensionless, 0–1). D50 = mass-median diameter, σg = D84/D50 geometric standard deviation.
 * Rejects d ≤ 0, D50 ≤ 0, σg ≤ 1. Example: D50 80 µm, σg 2.0 → F(45 µm) = 0.20325.
 * Source: science-reference §4.1 [Computed checks]; log-normal atomised powders [Checked].
 */
export function lognormalFractionFiner(diameterM: number, medianDiameterM: number, geometricStdDev: number): number {
  requirePositive("diameterM", diameterM);
  checkDistribution(medianDiameterM, geometricStdDev);
  return standardNormalCdf(Math.log(diameterM / medianDiameterM) / Math.log(geometricStdDev));
}

/**
 * Mass density of the log-normal distribution per metre of diameter, dF/dd (1/m):
 * φ(z)/(d·ln σg), z = ln(d/D50)/ln σg. Integrates to 1 over d > 0.
 * Source: derivative of lognormalFractionFiner (science-reference §4.1).
 */
export function lognormalMassDensityPerM(diameterM: number, medianDiameterM: number, geometricStdDev: number): number {
  requirePositive("diameterM", diameterM);
  checkDistribution(medianDiameterM, geometricStdDev);
  const lnSg = Math.log(geometricStdDev);
  const z = Math.log(diameterM / medianDiameterM) / lnSg;
  return Math.exp(-0.5 * z * z) / (Math.sqrt(2 * Math.PI) * diameterM * lnSg);
}

/**
 * Count-median diameter of a log-normal powder from its mass median (Hatch–Choate),
 * D_count = D50·exp(−3·ln²σg), metres. Example: 80 µm, σg 2 → 18.93 µm.
 * Source: Hatch–Choate relations [Pub, mem]; science-reference §4.1 check 3.
 */
export function countMedianDiameterM(medianDiameterM: number, geometricStdDev: number): number {
  checkDistribution(medianDiameterM, geometricStdDev);
  const l = Math.log(geometricStdDev);
  return medianDiameterM * Math.exp(-3 * l * l);
}

/**
 * Sauter mean diameter d32 (volume/surface) of a log-normal powder from its mass median
 * (Hatch–Choate), d32 = D50·exp(−½·ln²σg), metres. Example: 80 µm, σg 2 → 62.92 µm.
 * Source: Hatch–Choate relations [Pub, mem]; science-reference §4.1 check 3.
 */
export function sauterMeanDiameterM(medianDiameterM: number, geometricStdDev: number): number {
  checkDistribution(medianDiameterM, geometricStdDev);
  const l = Math.log(geometricStdDev);
  return medianDiameterM * Math.exp(-0.5 * l * l);
}

/**
 * Mass fractions of size classes split at the given sieve edges (metres, strictly increasing):
 * returns edges.length + 1 fractions — finer than the first edge, between successive edges,
 * coarser than the last — that sum to 1 exactly (up to rounding).
 * Source: science-reference §4.1 (differences of F(d)).
 */
export function sizeClassMassFractions(edgesM: readonly number[], medianDiameterM: number, geometricStdDev: number): number[] {
  checkDistribution(medianDiameterM, geometricStdDev);
  if (!Array.isArray(edgesM) || edgesM.length === 0) throw new InputError("edgesM", edgesM, "a non-empty array of sieve sizes in metres");
  const cumulative = edgesM.map((d, i) => {
    requirePositive(`edgesM[${i}]`, d);
    if (i > 0 && !(d > edgesM[i - 1])) throw new InputError(`edgesM[${i}]`, d, `> edgesM[${i - 1}] (${edgesM[i - 1]}); edges must increase`);
    return standardNormalCdf(Math.log(d / medianDiameterM) / Math.log(geometricStdDev));
  });
  const out: number[] = [cumulative[0]];
  for (let i = 1; i < cumulative.length; i++) out.push(cumulative[i] - cumulative[i - 1]);
  out.push(1 - cumulative[cumulative.length - 1]);
  return out;
}

/**
 * Draws droplet diameters (metres) from the log-normal powder with a seeded random source.
 * weighting "mass": each draw stands for an equal mass of powder (median D50);
 * "count": each draw is one droplet (median = count median, Hatch–Choate).
 * Source: science-reference §4.1; sampling d = D_median·σg^z with z standard normal.
 */
export function sampleDropletDiametersM(
  count: number,
  medianDiameterM: number,
  geometricStdDev: number,
  random: RandomSource,
  weighting: "mass" | "count" = "mass",
): Float64Array {
  requireInteger("count", count, { min: 0, max: 1e7 });
  checkDistribution(medianDiameterM, geometricStdDev);
  if (weighting !== "mass" && weighting !== "count") throw new InputError("weighting", weighting, "one of mass, count");
  if (typeof random !== "function") throw new InputError("random", random, "a seeded RandomSource (createRandom(seed))");
  const median = weighting === "mass" ? medianDiameterM : countMedianDiameterM(medianDiameterM, geometricStdDev);
  const lnSg = Math.log(geometricStdDev);
  const out = new Float64Array(count);
  for (let i = 0; i < count; i++) out[i] = median * Math.exp(lnSg * normalDeviate(random));
  return out;
}
