import { describe, expect, it } from "vitest";
import { effectivePartitionCoefficient } from "../../../../shared/metallurgy/solidification/effective-partition";
import { InputError } from "../../../../shared/metallurgy/errors";

describe("Burton–Prim–Slichter effective partition coefficient", () => {
  it("goes from k (perfect mixing) to 1 (no mixing)", () => {
    // k_eff = k/(k + (1 − k)exp(−Vδ/D)) — Burton, Prim & Slichter (1953) [Pub, mem]
    expect(effectivePartitionCoefficient(0.34, 1e-4, 0, 5e-9)).toBe(0.34);
    expect(effectivePartitionCoefficient(0.34, 1e-4, Infinity, 5e-9)).toBe(1);
    expect(effectivePartitionCoefficient(0.34, 0, 1e-3, 5e-9)).toBe(0.34);
    // Vδ/D = 1: k/(k + (1 − k)/e) — arithmetic of the formula
    const expected = 0.34 / (0.34 + 0.66 * Math.exp(-1));
    expect(effectivePartitionCoefficient(0.34, 5e-5, 1e-4, 5e-9)).toBeCloseTo(expected, 14);
  });

  it("rises monotonically with growth velocity", () => {
    let previous = 0;
    for (const v of [0, 1e-6, 1e-5, 1e-4, 1e-3]) {
      const k = effectivePartitionCoefficient(0.6, v, 1e-4, 5e-9);
      expect(k).toBeGreaterThanOrEqual(previous);
      expect(k).toBeLessThanOrEqual(1);
      previous = k;
    }
  });

  it("rejects bad input", () => {
    expect(() => effectivePartitionCoefficient(1.2, 1e-4, 1e-4, 5e-9)).toThrow(InputError);
    expect(() => effectivePartitionCoefficient(0.3, -1, 1e-4, 5e-9)).toThrow(/growthVelocity/);
    expect(() => effectivePartitionCoefficient(0.3, 1e-4, -1, 5e-9)).toThrow(/boundaryLayer/);
    expect(() => effectivePartitionCoefficient(0.3, 1e-4, 1e-4, 0)).toThrow(/liquidDiffusivity/);
  });
});
