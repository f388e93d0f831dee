import { describe, expect, it } from "vitest";
import {
  backDiffusionLiquidComposition,
  backDiffusionSolidComposition,
  clyneKurzOmega,
  fourierNumber,
} from "../../../../shared/metallurgy/solidification/back-diffusion";
import { leverSolidComposition } from "../../../../shared/metallurgy/solidification/lever-rule";
import { scheilSolidComposition } from "../../../../shared/metallurgy/solidification/scheil";
import { InputError } from "../../../../shared/metallurgy/errors";
import { integrateOverSolidFraction } from "./integrate";

describe("Clyne–Kurz back-diffusion", () => {
  it("Ω(α) matches the check values", () => {
    // [Computed] science-reference §3.1 check 4 (Clyne & Kurz 1981 [Pub, mem]), ±1e-6
    const cases: [number, number][] = [
      [0.1, 0.096626],
      [0.5, 0.248393],
      [1, 0.328855],
      [10, 0.476011],
      [1e6, 0.5],
    ];
    for (const [alpha, omega] of cases) expect(Math.abs(clyneKurzOmega(alpha) - omega)).toBeLessThan(1e-6);
    expect(clyneKurzOmega(0)).toBe(0);
  });

  it("C_s* matches the check values for α = 1 / 0 / 1e6", () => {
    // [Computed] §3.1 check 5: C0 1, k 0.34, f_s 0.9 → 0.94283 / 1.55410 / 0.83744 ±1e-5
    expect(Math.abs(backDiffusionSolidComposition(1, 0.34, 0.9, 1) - 0.94283)).toBeLessThan(1e-5);
    expect(Math.abs(backDiffusionSolidComposition(1, 0.34, 0.9, 0) - 1.5541)).toBeLessThan(1e-5);
    expect(Math.abs(backDiffusionSolidComposition(1, 0.34, 0.9, 1e6) - 0.83744)).toBeLessThan(1e-5);
  });

  it("reduces to Scheil as α → 0 and to the lever rule as α → ∞", () => {
    // Limits Ω → 0 (Scheil) and Ω → ½ (lever) [Computed], science-reference §3.1
    for (const k of [0.05, 0.34, 0.86]) {
      for (const f of [0.1, 0.5, 0.9, 0.99]) {
        const scheil = scheilSolidComposition(1, k, f);
        const lever = leverSolidComposition(1, k, f);
        expect(backDiffusionSolidComposition(1, k, f, 0)).toBeCloseTo(scheil, 12);
        // The gap closes steadily along α → 0 and α → ∞.
        const toScheil = [1e-2, 1e-4, 1e-6].map((a) => Math.abs(backDiffusionSolidComposition(1, k, f, a) - scheil) / scheil);
        const toLever = [1e2, 1e4, 1e6].map((a) => Math.abs(backDiffusionSolidComposition(1, k, f, a) - lever) / lever);
        expect(toScheil[1]).toBeLessThan(toScheil[0]);
        expect(toScheil[2]).toBeLessThan(toScheil[1]);
        expect(toScheil[2]).toBeLessThan(1e-4);
        expect(toLever[1]).toBeLessThan(toLever[0]);
        expect(toLever[2]).toBeLessThan(toLever[1]);
        expect(toLever[2]).toBeLessThan(1e-5);
        // Monotone in between: more back-diffusion, less segregation.
        expect(backDiffusionSolidComposition(1, k, f, 0.1)).toBeLessThan(scheil);
        expect(backDiffusionSolidComposition(1, k, f, 0.1)).toBeGreaterThan(lever);
      }
    }
  });

  it("conserves solute including the back-diffused flux (residual < 1e-9)", () => {
    // Brody–Flemings balance: C0 = ∫[C_s* + 2Ωk·f·dC_L/df] df + C_L(1 − f), science-reference §3.1 check 7
    for (const alpha of [0.01, 0.3, 1, 8.5]) {
      for (const [c0, k] of [[1, 0.34], [12, 0.86]] as const) {
        const beta = 2 * clyneKurzOmega(alpha) * k;
        const dLiquid = (f: number) => c0 * (1 - k) * Math.pow(1 - (1 - beta) * f, (k - 1) / (1 - beta) - 1);
        for (const f of [0.5, 0.9, 0.99]) {
          const solid = integrateOverSolidFraction((x) => backDiffusionSolidComposition(c0, k, x, alpha) + beta * x * dLiquid(x), f);
          const residual = (solid + backDiffusionLiquidComposition(c0, k, f, alpha) * (1 - f) - c0) / c0;
          expect(Math.abs(residual)).toBeLessThan(1e-9);
        }
      }
    }
  });

  it("gives the solid Fourier numbers of the back-diffusion example", () => {
    // [Computed] science-reference §3.4 example: 1400 °C, t_f 100 s, λ2 150 µm: α_C = 8.52
    // with D_C(γ) = 0.0761·exp(−32160/RT) cm²/s (Won & Thomas 2001 [Checked]) → 4.79e-10 m²/s
    expect(fourierNumber(4.792e-10, 100, 150)).toBeCloseTo(8.52, 2);
    expect(fourierNumber(0, 100, 150)).toBe(0);
    expect(() => fourierNumber(1e-10, 100, 0)).toThrow(/armSpacingUm/);
  });

  it("rejects bad input", () => {
    expect(() => clyneKurzOmega(-1)).toThrow(InputError);
    expect(() => backDiffusionSolidComposition(1, 0.34, 1, 0)).toThrow(/solidFraction/);
    expect(backDiffusionSolidComposition(1, 0.34, 1, 1e6)).toBeCloseTo(1, 5); // lever limit is finite at f = 1
    expect(() => backDiffusionSolidComposition(1, 0.34, 0.5, Number.POSITIVE_INFINITY)).toThrow(InputError);
  });
});
