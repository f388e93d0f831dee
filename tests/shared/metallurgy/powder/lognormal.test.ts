import { describe, expect, it } from "vitest";
import {
  countMedianDiameterM,
  POWDER_SIZE_DEFAULTS,
  lognormalFractionFiner,
  lognormalMassDensityPerM,
  sampleDropletDiametersM,
  sauterMeanDiameterM,
  sizeClassMassFractions,
  standardNormalCdf,
} from "../../../../shared/metallurgy/powder/lognormal";
import { createRandom } from "../../../../shared/metallurgy/random";
import { InputError } from "../../../../shared/metallurgy/errors";

const UM = 1e-6;

describe("log-normal powder size distribution", () => {
  it("fraction finer matches the check values", () => {
    // [Computed] science-reference §4.1 check 1: D50 80 µm, σg 2.0: F(45) 0.20325, F(150) 0.81777, F(80) 0.5, ±1e-5
    expect(Math.abs(lognormalFractionFiner(45 * UM, 80 * UM, 2) - 0.20325)).toBeLessThan(1e-5);
    expect(Math.abs(lognormalFractionFiner(150 * UM, 80 * UM, 2) - 0.81777)).toBeLessThan(1e-5);
    expect(Math.abs(lognormalFractionFiner(80 * UM, 80 * UM, 2) - 0.5)).toBeLessThan(1e-15);
    // [Computed] §4.1 check 2: F(22), D50 45, σg 2.3 → 0.19512 ±1e-5
    expect(Math.abs(lognormalFractionFiner(22 * UM, 45 * UM, 2.3) - 0.19512)).toBeLessThan(1e-5);
  });

  it("defaults to D50 80 µm, σg 2.0", () => {
    // [App] science-reference §4.1 default
    expect(POWDER_SIZE_DEFAULTS).toEqual({ medianDiameterM: 80e-6, geometricStdDev: 2.0 });
  });

  it("Hatch–Choate count median and Sauter mean match the check values", () => {
    // [Computed] §4.1 check 3 (Hatch–Choate [Pub, mem]): D50 80, σg 2.0 → 18.93 µm, 62.92 µm ±0.01 µm
    expect(Math.abs(countMedianDiameterM(80 * UM, 2) / UM - 18.93)).toBeLessThan(0.01);
    expect(Math.abs(sauterMeanDiameterM(80 * UM, 2) / UM - 62.92)).toBeLessThan(0.01);
  });

  it("mass density integrates to 1 and size-class fractions sum to 1", () => {
    // Invariant (issue #3): the log-normal mass fractions integrate to 1.
    for (const [d50, sg] of [[80 * UM, 2.0], [45 * UM, 2.3], [200 * UM, 1.5]] as const) {
      // ∫ f(d) dd over d = D50·e^u, u ∈ [−12 ln σg, 12 ln σg], composite Simpson on 4000 panels.
      const a = -12 * Math.log(sg);
      const b = -a;
      const n = 4000;
      const h = (b - a) / n;
      let sum = 0;
      for (let i = 0; i <= n; i++) {
        const u = a + i * h;
        const d = d50 * Math.exp(u);
        const w = i === 0 || i === n ? 1 : i % 2 === 1 ? 4 : 2;
        sum += w * lognormalMassDensityPerM(d, d50, sg) * d; // dd = d du
      }
      expect(Math.abs((sum * h) / 3 - 1)).toBeLessThan(1e-10);
      const classes = sizeClassMassFractions([20 * UM, 45 * UM, 75 * UM, 150 * UM, 250 * UM], d50, sg);
      expect(classes).toHaveLength(6);
      expect(Math.abs(classes.reduce((s, x) => s + x, 0) - 1)).toBeLessThan(1e-14);
      for (const x of classes) expect(x).toBeGreaterThanOrEqual(0);
      expect(classes[1]).toBeCloseTo(lognormalFractionFiner(45 * UM, d50, sg) - lognormalFractionFiner(20 * UM, d50, sg), 14);
    }
  });

  it("Φ is accurate in the tails", () => {
    // Φ(−5) = 2.866515718791939e-7 (standard normal table; erfc-based, no cancellation)
    expect(Math.abs(standardNormalCdf(-5) / 2.866515718791939e-7 - 1)).toBeLessThan(1e-12);
    expect(standardNormalCdf(0)).toBe(0.5);
  });

  it("samples seeded, reproducible diameters with the right medians", () => {
    const a = sampleDropletDiametersM(20001, 80 * UM, 2, createRandom(42));
    const b = sampleDropletDiametersM(20001, 80 * UM, 2, createRandom(42));
    expect(Array.from(a)).toEqual(Array.from(b));
    const median = (x: Float64Array) => Array.from(x).sort((p, q) => p - q)[Math.floor(x.length / 2)];
    expect(Math.abs(median(a) / (80 * UM) - 1)).toBeLessThan(0.03);
    const byCount = sampleDropletDiametersM(20001, 80 * UM, 2, createRandom(7), "count");
    expect(Math.abs(median(byCount) / countMedianDiameterM(80 * UM, 2) - 1)).toBeLessThan(0.03);
  });

  it("rejects d ≤ 0, D50 ≤ 0, σg ≤ 1 and unordered sieve edges", () => {
    expect(() => lognormalFractionFiner(0, 80 * UM, 2)).toThrow(/diameterM/);
    expect(() => lognormalFractionFiner(45 * UM, 0, 2)).toThrow(/medianDiameterM/);
    expect(() => lognormalFractionFiner(45 * UM, 80 * UM, 1)).toThrow(/geometricStdDev/);
    expect(() => sizeClassMassFractions([45 * UM, 20 * UM], 80 * UM, 2)).toThrow(/increase/);
    expect(() => sizeClassMassFractions([], 80 * UM, 2)).toThrow(InputError);
    expect(() => sampleDropletDiametersM(10, 80 * UM, 2, undefined as never)).toThrow(/random/);
  });
});
