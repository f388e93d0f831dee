import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { leverLiquidComposition, leverSolidComposition } from "../../../../shared/metallurgy/solidification/lever-rule";
import { InputError } from "../../../../shared/metallurgy/errors";

describe("lever rule", () => {
  it("matches the check values", () => {
    // [Computed] science-reference §3.1 check 1: C0 1, k 0.34, f_s 0.5 → lever C_s* 0.50746 ±1e-5
    expect(Math.abs(leverSolidComposition(1, 0.34, 0.5) - 0.50746)).toBeLessThan(1e-5);
    // [Computed] §3.1 check 2: f_s 0.9 → 0.83744 ±1e-5
    expect(Math.abs(leverSolidComposition(1, 0.34, 0.9) - 0.83744)).toBeLessThan(1e-5);
    // [Computed] §3.1 check 3: C0 12 (Cr), k 0.86, f_s 0.9 → 11.8078 ±1e-4
    expect(Math.abs(leverSolidComposition(12, 0.86, 0.9) - 11.8078)).toBeLessThan(1e-4);
  });

  it("ends at C0 when fully solid and conserves solute at every f_s", () => {
    // Lever rule mass balance f·C_s + (1 − f)·C_L = C0 (science-reference §3.1)
    expect(leverSolidComposition(1.3, 0.34, 1)).toBeCloseTo(1.3, 14);
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 20, noNaN: true }), fc.double({ min: 0.01, max: 0.99, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (c0, k, f) => {
        const balance = f * leverSolidComposition(c0, k, f) + (1 - f) * leverLiquidComposition(c0, k, f);
        expect(Math.abs(balance - c0) / c0).toBeLessThan(1e-12);
      }),
    );
  });

  it("rejects k outside (0, 1), C0 ≤ 0 and f_s outside [0, 1]", () => {
    expect(() => leverSolidComposition(1, 1, 0.5)).toThrow(InputError);
    expect(() => leverSolidComposition(1, 0, 0.5)).toThrow(InputError);
    expect(() => leverSolidComposition(0, 0.3, 0.5)).toThrow(/c0/);
    expect(() => leverLiquidComposition(1, 0.3, 1.01)).toThrow(/solidFraction/);
    expect(() => leverLiquidComposition(1, 0.3, Number.NaN)).toThrow(InputError);
  });
});
