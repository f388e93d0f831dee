/**
 * Powder simulation state: size classes from the core's log-normal distribution, droplet flights
 * per class, the tower animation, HIP and the ingot-versus-powder comparison.
 */
import { describe, expect, it } from "vitest";
import { parsePowderParams } from "@shared/sim/powder/params";
import { computePowderClasses, sizeClasses } from "@shared/sim/powder/classes";
import { createTower, dropletAt, primeTower, stepTower, towerLayout, VISIBLE_DROPLETS, niceCeiling } from "@shared/sim/powder/tower";
import { hipOutcome, hotYieldStrengthMPa } from "@shared/sim/powder/hip-model";
import { compareRoutes, medianClass } from "@shared/sim/powder/comparison";
import { describePowder } from "@shared/sim/powder/summary";

const params = parsePowderParams({});
const result = computePowderClasses(params);

describe("size classes", () => {
  it("cover the distribution: fractions sum to 1, diameters rise, and the median class holds D50", () => {
    const classes = sizeClasses(80, 2);
    expect(classes.reduce((s, c) => s + c.massFraction, 0)).toBeCloseTo(1, 12);
    for (let i = 1; i < classes.length; i++) expect(classes[i].diameterM).toBeGreaterThan(classes[i - 1].diameterM);
    const median = classes.find((c) => c.lowerM <= 80e-6 && c.upperM >= 80e-6)!;
    expect(median).toBeDefined();
    // Symmetric log-normal (science-reference §4.1): classes mirrored about D50 carry equal mass.
    const n = classes.length;
    expect(classes[1].massFraction).toBeCloseTo(classes[n - 2].massFraction, 10);
  });

  it("stays inside 2 µm – 1 mm even for a very wide spread", () => {
    const classes = sizeClasses(300, 3);
    expect(classes[0].lowerM).toBeGreaterThanOrEqual(2e-6);
    expect(classes[classes.length - 1].upperM).toBeLessThanOrEqual(1e-3 + 1e-12);
  });
});

describe("droplet classes", () => {
  it("cool more slowly, freeze lower and grow coarser dendrites as the diameter grows", () => {
    const c = result.classes;
    for (let i = 1; i < c.length; i++) {
      // Lumped cooling ∝ h/d with h = Nu·k/d (Ranz–Marshall, science-reference §4.2): falls with d.
      expect(c[i].coolingRateKPerS).toBeLessThan(c[i - 1].coolingRateKPerS);
      expect(c[i].solidAtFallM).toBeGreaterThan(c[i - 1].solidAtFallM);
      expect(c[i].armSpacingUm!).toBeGreaterThan(c[i - 1].armSpacingUm!);
    }
  });

  it("puts powder cooling rates in the 10³–10⁶ K/s range reported for gas atomisation", () => {
    // Science-reference §4.2: check values span 1e3–1e6 K/s; ~4e5 K/s reported for martensitic stainless powder.
    const median = medianClass(result.classes);
    expect(median.coolingRateKPerS).toBeGreaterThan(1e4);
    expect(median.coolingRateKPerS).toBeLessThan(1e6);
    expect(median.carbideSizeUm!).toBeGreaterThan(0.1);
    expect(median.carbideSizeUm!).toBeLessThan(3); // powder carbides ~0.5–3 µm [Mem, §4.2]
  });

  it("cools faster in faster gas and slower in argon than in nitrogen", () => {
    const slow = computePowderClasses(parsePowderParams({ gasVelocityMPerS: 20 }));
    const argon = computePowderClasses(parsePowderParams({ gas: "Ar" }));
    const i = 7;
    expect(slow.classes[i].coolingRateKPerS).toBeLessThan(result.classes[i].coolingRateKPerS);
    // Argon conducts heat worse than nitrogen (k 0.045 vs 0.067 W/m·K at the film temperature, §4.2).
    expect(argon.classes[i].coolingRateKPerS).toBeLessThan(result.classes[i].coolingRateKPerS);
  });
});

describe("tower animation", () => {
  const layout = towerLayout(result.classes);

  it("sizes the tower to the coarse droplets and plays their freezing in a few seconds", () => {
    const coarse = result.classes[result.classes.length - 2];
    expect(layout.heightM).toBeGreaterThan(coarse.solidAtFallM * 0.5);
    expect(layout.cumulativeMass[layout.cumulativeMass.length - 1]).toBeCloseTo(1, 12);
    expect([1, 2, 5, 10].map((m) => niceCeiling(m * 0.03))).toEqual([0.05, 0.1, 0.2, 0.5]);
  });

  it("holds about the intended number of droplets in flight, deterministically for a seed", () => {
    const a = createTower(3);
    primeTower(a, layout);
    for (let k = 0; k < 60; k++) stepTower(a, layout, layout.modelSecondsPerSecond / 60);
    expect(a.droplets.length).toBeGreaterThan(VISIBLE_DROPLETS * 0.5);
    expect(a.droplets.length).toBeLessThan(VISIBLE_DROPLETS * 2);
    const b = createTower(3);
    primeTower(b, layout);
    for (let k = 0; k < 60; k++) stepTower(b, layout, layout.modelSecondsPerSecond / 60);
    expect(b.droplets).toEqual(a.droplets);
    // Every droplet still in the tower has not yet passed its bottom.
    for (const d of a.droplets) expect(a.timeS - d.birthS).toBeLessThanOrEqual(layout.lifeS[d.classIndex] + 1e-12);
  });

  it("reads a droplet's temperature and solid fraction from its class's flight", () => {
    const view = { fallM: 0, tempK: 0, solidFraction: 0, diameterM: 0 };
    const d = { classIndex: 5, spread: 0, birthS: 0 };
    const f = result.classes[5].flight;
    dropletAt(d, result.classes, f.timeS[10], view);
    expect(view.tempK).toBeCloseTo(f.tempK[10], 6);
    expect(view.fallM).toBeCloseTo(f.fallM[10], 9);
    dropletAt(d, result.classes, f.timeS[f.timeS.length - 1] * 2, view);
    expect(view.solidFraction).toBe(1);
  });
});

describe("hot isostatic pressing", () => {
  it("reproduces the core's check value at 30 MPa yield strength (1150 °C in our curve)", () => {
    expect(hotYieldStrengthMPa(1150)).toBe(30);
    // Science-reference §4.3 check 1: D0 0.64, P 100 MPa, σ_y 30 MPa → 0.99326.
    expect(hipOutcome(100, 1150).relativeDensity).toBeCloseTo(0.99326, 4);
  });

  it("densifies more with pressure and temperature, and the can shrinks with density", () => {
    expect(hipOutcome(150, 1150).relativeDensity).toBeGreaterThan(hipOutcome(50, 1150).relativeDensity);
    expect(hipOutcome(100, 1200).relativeDensity).toBeGreaterThan(hipOutcome(100, 1000).relativeDensity);
    expect(hipOutcome(100, 900).linearShrinkage).toBeLessThan(hipOutcome(100, 1150).linearShrinkage);
    // Full density from 0.64: 1 − 0.64^(1/3) = 13.82 % (mass conservation, §4.3 check 4 form).
    expect(hipOutcome(100, 1150).fullDensityShrinkage).toBeCloseTo(1 - Math.cbrt(0.64), 12);
  });
});

describe("ingot versus powder", () => {
  const comparison = compareRoutes(params.composition, result.classes);

  it("gives the powder a structure one to two orders of magnitude finer and no particle-to-particle segregation", () => {
    expect(comparison.refinement!).toBeGreaterThan(10);
    expect(comparison.powder.carbideSizeUm!).toBeLessThan(comparison.ingot.carbideSizeUm!);
    expect(comparison.powder.macroSpreadV).toBe(1);
    expect(comparison.ingot.macroSpreadV!).toBeGreaterThan(1);
  });

  it("summarises the run in words that change with the inputs", () => {
    const hip = hipOutcome(params.hipPressureMPa, params.hipTempC);
    const text = describePowder(params, result, comparison, hip);
    expect(text).toMatch(/nitrogen at 100 m\/s/);
    expect(text).toMatch(/times finer/);
    const other = describePowder({ ...params, hipPressureMPa: 50 }, result, comparison, hipOutcome(50, params.hipTempC));
    expect(other).not.toBe(text);
  });
});
