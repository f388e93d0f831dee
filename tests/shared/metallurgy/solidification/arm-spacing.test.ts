import { describe, expect, it } from "vitest";
import {
  ARM_SPACING_FIT_MAX_CARBON_MASS_PCT,
  armSpacingCarbonClampWarning,
  armSpacingUnchecked,
  eutecticCarbideSizeUm,
  secondaryArmSpacingUm,
} from "../../../../shared/metallurgy/solidification/arm-spacing";
import { InputError } from "../../../../shared/metallurgy/errors";

describe("secondary dendrite arm spacing (Won & Thomas 2001)", () => {
  it("matches the check values", () => {
    // [Computed] science-reference §3.4 checks 1–3 (fit [Checked] Won & Thomas 2001), ±0.01 µm
    expect(Math.abs(secondaryArmSpacingUm(1, 0.1).value - 97.01)).toBeLessThan(0.01);
    expect(Math.abs(secondaryArmSpacingUm(1, 1.0).value - 143.9)).toBeLessThan(0.01);
    expect(Math.abs(secondaryArmSpacingUm(0.1, 1.0).value - 330.87)).toBeLessThan(0.01);
    expect(Math.abs(secondaryArmSpacingUm(10, 0.5).value - 85.37)).toBeLessThan(0.01);
    expect(secondaryArmSpacingUm(10, 0.5).warnings).toEqual([]);
  });

  it("extrapolates to powder cooling rates with a warning", () => {
    // [Computed] §3.4 check 4: C 1.0, CR 1e3 / 1e4 / 1e5 → 11.84 / 5.148 / 2.239 µm ±0.005 (warn)
    const cases: [number, number][] = [
      [1e3, 11.84],
      [1e4, 5.148],
      [1e5, 2.239],
    ];
    for (const [cr, expected] of cases) {
      const r = secondaryArmSpacingUm(cr, 1.0);
      expect(Math.abs(r.value - expected)).toBeLessThan(0.005);
      expect(r.warnings.join(" ")).toMatch(/extrapolation/);
    }
  });

  it("shows the non-monotonic carbon dependence and warns above 1 % C", () => {
    // §3.4: 0.8 % C gives a larger λ2 than 1.0 % C
    expect(secondaryArmSpacingUm(1, 0.8).value).toBeGreaterThan(secondaryArmSpacingUm(1, 1.0).value);
    expect(secondaryArmSpacingUm(1, 1.2).warnings.join(" ")).toMatch(/above 1.0 %/);
  });

  it("holds the carbon term at its 1.0 % value above the fit's calibration limit, with a warning", () => {
    // Calibration limit: science-reference §3.4 ("warn C > 1.0"). Above it the value equals the
    // C = 1.0 fit value, [Computed] §3.4 check 2: CR 1 → 143.90 µm, CR 0.1 → 330.87 µm (±0.01).
    for (const c of [1.2, 2.45, 3.0]) {
      expect(Math.abs(secondaryArmSpacingUm(1, c).value - 143.9)).toBeLessThan(0.01);
      expect(Math.abs(secondaryArmSpacingUm(0.1, c).value - 330.87)).toBeLessThan(0.01);
      expect(armSpacingUnchecked(1, c)).toBe(secondaryArmSpacingUm(1, c).value); // the ingot solver uses the same value
    }
    expect(ARM_SPACING_FIT_MAX_CARBON_MASS_PCT).toBe(1.0);
    const a11 = secondaryArmSpacingUm(0.1, 2.45);
    expect(a11.warnings.at(-1)).toBe(armSpacingCarbonClampWarning(2.45));
    expect(a11.warnings.at(-1)).toMatch(/held at the 1\.0 % value/);
    // The literal fit at 2.45 % C: 143.9·CR^−0.3616·2.45^(0.5501 − 1.996·2.45) (Won & Thomas 2001, §3.4) —
    // the carbon term is 0.02046, so dendrites 49 times finer (≈ 6.8 µm at 0.1 °C/s), which the warning names.
    const literal = 143.9 * Math.pow(0.1, -0.3616) * Math.pow(2.45, 0.5501 - 1.996 * 2.45);
    expect(literal).toBeCloseTo(6.77, 2);
    expect(a11.warnings.at(-1)).toMatch(/49 times finer/);
    // At and below 1.0 % C the published fit applies unchanged, without the carbon warning.
    expect(secondaryArmSpacingUm(1, 1.0).warnings).toEqual([]);
    expect(secondaryArmSpacingUm(1, 0.8).warnings).toEqual([]);
  });

  it("estimates carbide size as 0.3·λ2 (powder ≈ 0.5–3 µm)", () => {
    // [App] science-reference §4.2: d_carbide ≈ 0.3·λ2; powder carbides ≈ 0.5–3 µm [Mem]
    // at 1e4–1e5 K/s (typical gas-atomised cooling, §4.2) and 1 % C: λ2 5.148 / 2.239 µm → 1.54 / 0.67 µm
    for (const rate of [1e4, 1e5]) {
      const powder = eutecticCarbideSizeUm(secondaryArmSpacingUm(rate, 1.0).value);
      expect(powder).toBeGreaterThan(0.5);
      expect(powder).toBeLessThan(3);
    }
    expect(eutecticCarbideSizeUm(100)).toBeCloseTo(30, 12);
    expect(eutecticCarbideSizeUm(100, 0.2)).toBeCloseTo(20, 12);
    expect(() => eutecticCarbideSizeUm(0)).toThrow(InputError);
  });

  it("rejects C ≤ 0 and CR ≤ 0", () => {
    expect(() => secondaryArmSpacingUm(1, 0)).toThrow(/carbonMassPct/);
    expect(() => secondaryArmSpacingUm(0, 0.5)).toThrow(/coolingRateCPerS/);
    expect(() => secondaryArmSpacingUm(Number.NaN, 0.5)).toThrow(InputError);
  });
});
