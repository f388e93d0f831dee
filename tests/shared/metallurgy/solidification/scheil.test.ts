import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  scheilLiquidComposition,
  scheilLiquidFractionAtEutectic,
  scheilMeanSolidComposition,
  scheilSolidComposition,
} from "../../../../shared/metallurgy/solidification/scheil";
import { InputError } from "../../../../shared/metallurgy/errors";
import { integrateOverSolidFraction } from "./integrate";

describe("Scheil–Gulliver", () => {
  it("matches the check values", () => {
    // [Computed] science-reference §3.1 check 1: C0 1, k 0.34, f_s 0.5 → C_s* 0.53723, C_L 1.58008 ±1e-5
    expect(Math.abs(scheilSolidComposition(1, 0.34, 0.5) - 0.53723)).toBeLessThan(1e-5);
    expect(Math.abs(scheilLiquidComposition(1, 0.34, 0.5) - 1.58008)).toBeLessThan(1e-5);
    // [Computed] §3.1 check 2: f_s 0.9 → C_s* 1.55410, C_L 4.57088 ±1e-5
    expect(Math.abs(scheilSolidComposition(1, 0.34, 0.9) - 1.5541)).toBeLessThan(1e-5);
    expect(Math.abs(scheilLiquidComposition(1, 0.34, 0.9) - 4.57088)).toBeLessThan(1e-5);
    // [Computed] §3.1 check 3: C0 12 (Cr), k 0.86, f_s 0.9 → Scheil C_s* 14.2456 ±1e-4
    expect(Math.abs(scheilSolidComposition(12, 0.86, 0.9) - 14.2456)).toBeLessThan(1e-4);
  });

  it("gives the liquid fraction left at the eutectic (Fe–C)", () => {
    // [Computed] §3.1 check 6: k 0.34, C_E 4.3 → f_L 0.1097 / 0.2028 / 0.3135 at C0 1.0 / 1.5 / 2.0 ±1e-4
    expect(Math.abs(scheilLiquidFractionAtEutectic(1.0, 0.34, 4.3) - 0.1097)).toBeLessThan(1e-4);
    expect(Math.abs(scheilLiquidFractionAtEutectic(1.5, 0.34, 4.3) - 0.2028)).toBeLessThan(1e-4);
    expect(Math.abs(scheilLiquidFractionAtEutectic(2.0, 0.34, 4.3) - 0.3135)).toBeLessThan(1e-4);
    expect(scheilLiquidFractionAtEutectic(4.3, 0.34, 4.3)).toBe(1);
    expect(() => scheilLiquidFractionAtEutectic(4.5, 0.34, 4.3)).toThrow(/eutectic/);
  });

  it("conserves solute: ∫C_s* df + C_L(1 − f) = C0 with residual < 1e-9", () => {
    // [Computed] §3.1 check 7 (mass balance at f = 0.5, 0.9, 0.99)
    for (const [c0, k] of [[1, 0.34], [12, 0.86], [0.2, 0.035]] as const) {
      for (const f of [0.5, 0.9, 0.99]) {
        const inSolid = integrateOverSolidFraction((x) => scheilSolidComposition(c0, k, x), f);
        const residual = (inSolid + scheilLiquidComposition(c0, k, f) * (1 - f) - c0) / c0;
        expect(Math.abs(residual)).toBeLessThan(1e-9);
        // The closed-form mean solid composition agrees with the integral.
        expect(Math.abs(scheilMeanSolidComposition(c0, k, f) * f - inSolid) / c0).toBeLessThan(1e-9);
      }
    }
  });

  it("liquid composition rises with solid fraction for k < 1 (property)", () => {
    // Scheil C_L = C0(1 − f)^(k − 1) is increasing for k < 1 (science-reference §3.1)
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 20, noNaN: true }),
        fc.double({ min: 0.01, max: 0.99, noNaN: true }),
        fc.double({ min: 0, max: 0.999, noNaN: true }),
        fc.double({ min: 0, max: 0.999, noNaN: true }),
        (c0, k, a, b) => {
          const [f1, f2] = a <= b ? [a, b] : [b, a];
          expect(scheilLiquidComposition(c0, k, f2)).toBeGreaterThanOrEqual(scheilLiquidComposition(c0, k, f1));
          expect(scheilSolidComposition(c0, k, f2)).toBeGreaterThanOrEqual(scheilSolidComposition(c0, k, f1));
        },
      ),
    );
  });

  it("rejects f_s = 1 (divergent), k ≥ 1 and bad C0", () => {
    expect(() => scheilLiquidComposition(1, 0.34, 1)).toThrow(/solidFraction/);
    expect(() => scheilSolidComposition(1, 0.34, 1)).toThrow(InputError);
    expect(() => scheilSolidComposition(1, 1.2, 0.5)).toThrow(/partition coefficient/);
    expect(() => scheilSolidComposition(-1, 0.34, 0.5)).toThrow(InputError);
    expect(() => scheilSolidComposition(1, 0.34, -0.1)).toThrow(InputError);
  });
});
