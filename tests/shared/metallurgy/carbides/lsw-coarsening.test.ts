import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { InputError } from "@shared/metallurgy/errors";
import { createRandom } from "@shared/metallurgy/random";
import { LSW_MAX_SCALED_RADIUS, lswDistribution, lswMeanRadius, lswRateConstantM3PerS, sampleLswScaledRadius } from "@shared/metallurgy/carbides";

const within = (actual: number, expected: number, tol: number) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tol);

/** Composite Simpson rule on [a, b] with n (even) intervals. */
function simpson(f: (x: number) => number, a: number, b: number, n = 20000): number {
  const h = (b - a) / n;
  let s = f(a) + f(b);
  for (let i = 1; i < n; i++) s += (i % 2 ? 4 : 2) * f(a + i * h);
  return (s * h) / 3;
}

/** Golden-section search for the maximum of a unimodal function. */
function argmax(f: (x: number) => number, a: number, b: number): number {
  const g = (Math.sqrt(5) - 1) / 2;
  let lo = a, hi = b;
  for (let i = 0; i < 200; i++) {
    const c = hi - g * (hi - lo), d = lo + g * (hi - lo);
    if (f(c) > f(d)) hi = d;
    else lo = c;
  }
  return (lo + hi) / 2;
}

describe("lswDistribution", () => {
  it("integrates to 1 with mean 1, mode 1.1346 and h(1) = 1.7264 (science-reference §2.5 check 1)", () => {
    within(simpson(lswDistribution, 0, LSW_MAX_SCALED_RADIUS), 1.0, 1e-4); // [Computed] §2.5 check 1, numerical quadrature
    within(simpson((r) => r * lswDistribution(r), 0, LSW_MAX_SCALED_RADIUS), 1.0, 1e-4); // [Computed] §2.5 check 1
    within(argmax(lswDistribution, 0.5, 1.45), 1.1346, 1e-4); // [Computed] §2.5 check 1
    within(lswDistribution(1), 1.7264, 1e-4); // [Computed] §2.5 check 1
  });

  it("is zero at ρ = 0 and from 3/2 up, and never negative", () => {
    expect(lswDistribution(0)).toBe(0);
    expect(lswDistribution(1.5)).toBe(0);
    expect(lswDistribution(7)).toBe(0);
    fc.assert(
      fc.property(fc.double({ min: 0, max: 10, noNaN: true }), (r) => {
        expect(lswDistribution(r)).toBeGreaterThanOrEqual(0);
      }),
    );
  });

  it("rejects negative and non-finite ρ", () => {
    expect(() => lswDistribution(-0.1)).toThrow(InputError);
    expect(() => lswDistribution(Number.NaN)).toThrow(InputError);
  });
});

describe("lswMeanRadius", () => {
  it("follows r³ − r0³ = k·t (science-reference §2.5 check 2)", () => {
    within(lswMeanRadius(0.5, 0.01, 100), 1.04, 1e-4); // [Computed] §2.5 check 2: µm, µm³/h, h
    within(lswMeanRadius(0.5, 0.01, 1000), 2.1634, 1e-4); // [Computed] §2.5 check 2
    expect(lswMeanRadius(0.5, 0.01, 0)).toBe(0.5);
  });

  it("grows monotonically with time", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 10, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1e4, noNaN: true }), (r0, k, t) => {
        const r = lswMeanRadius(r0, k, t);
        expect(r).toBeGreaterThanOrEqual(r0 - 1e-12);
        expect(lswMeanRadius(r0, k, t + 1)).toBeGreaterThanOrEqual(r);
      }),
    );
  });

  it("rejects negative inputs (§2.5 valid inputs)", () => {
    expect(() => lswMeanRadius(-1, 0.01, 1)).toThrow(InputError);
    expect(() => lswMeanRadius(1, -0.01, 1)).toThrow(InputError);
    expect(() => lswMeanRadius(1, 0.01, -1)).toThrow(InputError);
    expect(() => lswMeanRadius(1, 0.01, Number.POSITIVE_INFINITY)).toThrow(InputError);
  });
});

describe("lswRateConstantM3PerS", () => {
  it("evaluates k = 8γ·c∞·D·Vm²/(9RT) [Pub, mem] §2.5", () => {
    const k = lswRateConstantM3PerS({ interfaceEnergyJPerM2: 0.5, solubilityMolPerM3: 100, diffusivityM2PerS: 1e-14, molarVolumeM3PerMol: 1e-5, tempC: 1000 });
    within(k, (8 * 0.5 * 100 * 1e-14 * 1e-10) / (9 * 8.314462618 * 1273.15), 1e-40);
    expect(() => lswRateConstantM3PerS({ interfaceEnergyJPerM2: 0, solubilityMolPerM3: 1, diffusivityM2PerS: 1, molarVolumeM3PerMol: 1, tempC: 20 })).toThrow(InputError);
    expect(() => lswRateConstantM3PerS({ interfaceEnergyJPerM2: 1, solubilityMolPerM3: 1, diffusivityM2PerS: 1, molarVolumeM3PerMol: 1, tempC: -300 })).toThrow(InputError);
  });
});

describe("sampleLswScaledRadius", () => {
  it("draws ρ in [0, 1.5) with mean ≈ 1 from a seeded source", () => {
    const random = createRandom(17);
    let sum = 0;
    let min = Infinity;
    let max = -Infinity;
    const n = 20000;
    for (let i = 0; i < n; i++) {
      const rho = sampleLswScaledRadius(random);
      sum += rho;
      min = Math.min(min, rho);
      max = Math.max(max, rho);
    }
    expect(min).toBeGreaterThanOrEqual(0);
    expect(max).toBeLessThan(1.5);
    within(sum / n, 1, 0.01); // standard error ≈ 0.0016
  });
});
