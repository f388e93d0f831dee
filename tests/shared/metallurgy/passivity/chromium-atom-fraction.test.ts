import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { InputError } from "@shared/metallurgy/errors";
import { chromiumAtomFraction, chromiumMassPctFromAtomFraction } from "@shared/metallurgy/passivity";

const within = (actual: number, expected: number, tol: number) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tol);

describe("chromiumAtomFraction / chromiumMassPctFromAtomFraction", () => {
  it("converts wt% to atom fraction (science-reference §1a check 2)", () => {
    // [Computed] science-reference §1a check 2, ±2e-4
    within(chromiumAtomFraction(10.5), 0.1119, 2e-4);
    within(chromiumAtomFraction(12), 0.1277, 2e-4);
    within(chromiumAtomFraction(13), 0.1383, 2e-4);
    within(chromiumAtomFraction(18), 0.1908, 2e-4);
  });

  it("converts thresholds p_c back to wt% (science-reference §1a check 3)", () => {
    // [Computed] science-reference §1a check 3, ±0.02 wt%
    within(chromiumMassPctFromAtomFraction(0.2459615), 23.3, 0.02);
    within(chromiumMassPctFromAtomFraction(0.175), 16.49, 0.02);
    within(chromiumMassPctFromAtomFraction(0.1372), 12.9, 0.02);
  });

  it("has the end points 0 and 1 fixed", () => {
    expect(chromiumAtomFraction(0)).toBe(0);
    expect(chromiumAtomFraction(100)).toBe(1);
    expect(chromiumMassPctFromAtomFraction(0)).toBe(0);
    expect(chromiumMassPctFromAtomFraction(1)).toBe(100);
  });

  it("is monotone and inverted by its inverse", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 100, noNaN: true }), fc.double({ min: 0, max: 100, noNaN: true }), (a, b) => {
        within(chromiumMassPctFromAtomFraction(chromiumAtomFraction(a)), a, 1e-9);
        if (a < b) expect(chromiumAtomFraction(a)).toBeLessThanOrEqual(chromiumAtomFraction(b));
      }),
    );
  });

  it("rejects out-of-range and non-finite input", () => {
    expect(() => chromiumAtomFraction(-0.1)).toThrow(InputError);
    expect(() => chromiumAtomFraction(100.1)).toThrow(InputError);
    expect(() => chromiumAtomFraction(Number.POSITIVE_INFINITY)).toThrow(InputError);
    expect(() => chromiumMassPctFromAtomFraction(1.01)).toThrow(InputError);
    expect(() => chromiumMassPctFromAtomFraction(Number.NaN)).toThrow(/x = NaN/);
  });
});
