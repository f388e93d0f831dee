import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { InputError } from "@shared/metallurgy/errors";
import { createRandom } from "@shared/metallurgy/random";
import { fillRandomOccupancy, spanningCurve, spanningProbability, type LatticeType } from "@shared/metallurgy/passivity";

const run = (lattice: LatticeType, neighbours: 1 | 2, p: number, seed = 2024) =>
  spanningProbability({
    lattice,
    neighbours,
    size: lattice === "sc" || lattice === "bcc" ? 32 : 64,
    crAtomFraction: p,
    samples: 200,
    seed,
  });

describe("spanningProbability", () => {
  // [Computed] science-reference §1a check 4: open boundaries, L = 32 (3-D) / 64 (2-D), ≥ 200 samples,
  // spanning between opposite faces along one axis; bcc in primitive coordinates. Observed 0 or 1 there.
  it("sc NN: p = 0.25 → < 0.05, p = 0.40 → > 0.95 (§1a check 4)", () => {
    expect(run("sc", 1, 0.25).probability).toBeLessThan(0.05); // [Computed] §1a check 4
    expect(run("sc", 1, 0.4).probability).toBeGreaterThan(0.95); // [Computed] §1a check 4
  });

  it("bcc NN: p = 0.20 → < 0.05, p = 0.30 → > 0.95 (§1a check 4)", () => {
    expect(run("bcc", 1, 0.2).probability).toBeLessThan(0.05); // [Computed] §1a check 4
    expect(run("bcc", 1, 0.3).probability).toBeGreaterThan(0.95); // [Computed] §1a check 4
  });

  it("bcc NN+2NN: p = 0.14 → < 0.05, p = 0.22 → > 0.95 (§1a check 4)", () => {
    expect(run("bcc", 2, 0.14).probability).toBeLessThan(0.05); // [Computed] §1a check 4
    expect(run("bcc", 2, 0.22).probability).toBeGreaterThan(0.95); // [Computed] §1a check 4
  });

  it("square NN: p = 0.50 → < 0.05, p = 0.70 → > 0.95 (§1a check 4)", () => {
    expect(run("square", 1, 0.5).probability).toBeLessThan(0.05); // [Computed] §1a check 4
    expect(run("square", 1, 0.7).probability).toBeGreaterThan(0.95); // [Computed] §1a check 4
  });

  it("is near one half at the known thresholds of 2-D lattices", () => {
    // triangular NN p_c = 1/2 exactly [Mem]; at L = 64 the spanning probability at p_c is near 1/2
    const tri = spanningProbability({ lattice: "triangular", neighbours: 1, size: 64, crAtomFraction: 0.5, samples: 400, seed: 7 });
    expect(tri.probability).toBeGreaterThan(0.3);
    expect(tri.probability).toBeLessThan(0.7);
  });

  it("replays exactly from a seed and reports its sample counts", () => {
    const a = spanningProbability({ lattice: "square", neighbours: 1, size: 32, crAtomFraction: 0.59, samples: 50, seed: 11 });
    const b = spanningProbability({ lattice: "square", neighbours: 1, size: 32, crAtomFraction: 0.59, samples: 50, seed: 11 });
    expect(a).toEqual(b);
    expect(a.samples).toBe(50);
    expect(a.probability).toBe(a.spanningSamples / 50);
  });

  it("gives 0 at p = 0 and 1 at p = 1", () => {
    const base = { lattice: "bcc" as const, neighbours: 1 as const, size: 16, samples: 3, seed: 1 };
    expect(spanningProbability({ ...base, crAtomFraction: 0 }).probability).toBe(0);
    expect(spanningProbability({ ...base, crAtomFraction: 1 }).probability).toBe(1);
  });

  it("rises with Cr fraction, statistically, with independent seeds", () => {
    // Two independent binomial estimates 0.1 apart in p around the 2-D threshold: the higher p must not
    // score lower by more than 4 standard errors (n = 120 each).
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 0.62, noNaN: true }), fc.integer({ min: 1, max: 1e6 }), (p, seed) => {
        const lo = spanningProbability({ lattice: "square", neighbours: 1, size: 32, crAtomFraction: p, samples: 120, seed });
        const hi = spanningProbability({ lattice: "square", neighbours: 1, size: 32, crAtomFraction: p + 0.1, samples: 120, seed: seed + 1 });
        const se = Math.sqrt((lo.probability * (1 - lo.probability) + hi.probability * (1 - hi.probability)) / 120 + 1e-4);
        expect(hi.probability).toBeGreaterThanOrEqual(lo.probability - 4 * se);
      }),
      { numRuns: 12 },
    );
  });

  it("warns below the finite-size limit and rejects L < 16 (§1a valid inputs)", () => {
    const base = { lattice: "sc" as const, neighbours: 1 as const, crAtomFraction: 0.3, samples: 2, seed: 1 };
    expect(spanningProbability({ ...base, size: 16 }).warnings.join(" ")).toMatch(/finite-size/);
    expect(spanningProbability({ ...base, size: 32 }).warnings).toEqual([]);
    expect(() => spanningProbability({ ...base, size: 15 })).toThrow(InputError);
    expect(() => spanningProbability({ ...base, lattice: "square", size: 12 })).toThrow(InputError);
  });

  it("accepts explicit slab dimensions with the spanning axis at least 16 long", () => {
    const slab = spanningProbability({ lattice: "bcc", neighbours: 2, size: [32, 32, 3], crAtomFraction: 0.3, samples: 20, seed: 5 });
    expect(slab.warnings.join(" ")).toMatch(/crossover/);
    expect(() => spanningProbability({ lattice: "bcc", neighbours: 2, size: [32, 32, 3], axis: 2, crAtomFraction: 0.3, samples: 2, seed: 5 })).toThrow(InputError);
  });

  it("rejects bad input with InputError", () => {
    const base = { lattice: "sc" as const, neighbours: 1 as const, size: 16, crAtomFraction: 0.3, samples: 2, seed: 1 };
    expect(() => spanningProbability({ ...base, crAtomFraction: 1.1 })).toThrow(InputError);
    expect(() => spanningProbability({ ...base, crAtomFraction: Number.NaN })).toThrow(InputError);
    expect(() => spanningProbability({ ...base, samples: 0 })).toThrow(InputError);
    expect(() => spanningProbability({ ...base, samples: 2.5 })).toThrow(InputError);
    expect(() => spanningProbability({ ...base, seed: Number.POSITIVE_INFINITY })).toThrow(InputError);
    expect(() => spanningProbability({ ...base, lattice: "fcc" as never })).toThrow(InputError);
    expect(() => spanningProbability({ ...base, axis: 2, lattice: "square", size: 16 })).toThrow(InputError);
  });
});

describe("spanningCurve", () => {
  it("equals spanningProbability point by point (same seed, common random numbers)", () => {
    const base = { lattice: "square" as const, neighbours: 1 as const, size: 32, samples: 40, seed: 99 };
    const curve = spanningCurve({ ...base, crAtomFractions: [0.55, 0.6, 0.65] });
    for (const point of curve.points) {
      expect(point.probability).toBe(spanningProbability({ ...base, crAtomFraction: point.crAtomFraction }).probability);
    }
  });

  it("is exactly non-decreasing in Cr fraction for any seed", () => {
    fc.assert(
      fc.property(fc.integer(), fc.uniqueArray(fc.double({ min: 0.4, max: 0.8, noNaN: true }), { minLength: 2, maxLength: 5 }), (seed, ps) => {
        const sorted = [...ps].sort((a, b) => a - b);
        const curve = spanningCurve({ lattice: "square", neighbours: 1, size: 16, samples: 10, seed, crAtomFractions: sorted });
        for (let i = 1; i < curve.points.length; i++) expect(curve.points[i].probability).toBeGreaterThanOrEqual(curve.points[i - 1].probability);
      }),
      { numRuns: 20 },
    );
  });

  it("reports progress up to 1", () => {
    const progress: number[] = [];
    spanningCurve({ lattice: "bcc", neighbours: 2, size: 16, samples: 30, seed: 3, crAtomFractions: [0.15, 0.2, 0.25], onProgress: (f) => progress.push(f) });
    expect(progress.length).toBeGreaterThan(10);
    expect(progress.at(-1)).toBe(1);
    for (let i = 1; i < progress.length; i++) expect(progress[i]).toBeGreaterThan(progress[i - 1]);
  });

  it("rejects an empty or out-of-range fraction list", () => {
    const base = { lattice: "square" as const, neighbours: 1 as const, size: 16, samples: 2, seed: 1 };
    expect(() => spanningCurve({ ...base, crAtomFractions: [] })).toThrow(InputError);
    expect(() => spanningCurve({ ...base, crAtomFractions: [0.5, -0.1] })).toThrow(InputError);
  });
});

describe("fillRandomOccupancy", () => {
  it("fills at the requested fraction and replays from a seed", () => {
    const a = fillRandomOccupancy(new Uint8Array(40_000), 0.3, createRandom(5));
    const b = fillRandomOccupancy(new Uint8Array(40_000), 0.3, createRandom(5));
    expect(a.every((v, i) => v === b[i])).toBe(true);
    let occupied = 0;
    for (const v of a) occupied += v;
    expect(Math.abs(occupied / a.length - 0.3)).toBeLessThan(0.01); // > 4 standard errors (0.0023)
  });
});
