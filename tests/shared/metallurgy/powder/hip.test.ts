import { describe, expect, it } from "vitest";
import { hipLinearShrinkage, hipRelativeDensity } from "../../../../shared/metallurgy/powder/hip";
import { InputError } from "../../../../shared/metallurgy/errors";

describe("hot isostatic pressing (yield-limited HIP-map model)", () => {
  it("matches the check values", () => {
    // [Computed] science-reference §4.3 check 1 (Helle, Easterling & Ashby 1985 [Pub, mem]):
    // D0 0.64, P 100, σ_y 30 → stage-1 value 1.0583 (≥ 0.9) → stage 2 D = 0.99326, ±1e-4
    const a = hipRelativeDensity({ initialDensity: 0.64, pressureMPa: 100, yieldStrengthMPa: 30 });
    expect(Math.abs(a.stage1Density - 1.0583)).toBeLessThan(1e-4);
    expect(a.stage).toBe(2);
    expect(Math.abs(a.relativeDensity - 0.99326)).toBeLessThan(1e-4);
    // [Computed] §4.3 check 2: D0 0.64, P 100, σ_y 200 → 0.73718 (stage 1)
    const b = hipRelativeDensity({ initialDensity: 0.64, pressureMPa: 100, yieldStrengthMPa: 200 });
    expect(b.stage).toBe(1);
    expect(Math.abs(b.relativeDensity - 0.73718)).toBeLessThan(1e-4);
    // [Computed] §4.3 check 3: D0 0.65, P 150, σ_y 40 → 0.99639
    expect(Math.abs(hipRelativeDensity({ initialDensity: 0.65, pressureMPa: 150, yieldStrengthMPa: 40 }).relativeDensity - 0.99639)).toBeLessThan(1e-4);
  });

  it("linear shrinkage to full density matches the check values", () => {
    // [Computed] §4.3 check 4: D0 0.60 / 0.65 / 0.70 → 15.66 % / 13.38 % / 11.21 %, ±0.01 %
    expect(Math.abs(hipLinearShrinkage(0.6) - 0.1566)).toBeLessThan(1e-4);
    expect(Math.abs(hipLinearShrinkage(0.65) - 0.1338)).toBeLessThan(1e-4);
    expect(Math.abs(hipLinearShrinkage(0.7) - 0.1121)).toBeLessThan(1e-4);
    expect(hipLinearShrinkage(0.7, 0.7)).toBe(0);
  });

  it("never reduces density at the stage switch", () => {
    const r = hipRelativeDensity({ initialDensity: 0.89, pressureMPa: 10, yieldStrengthMPa: 30 });
    expect(r.stage).toBe(2);
    expect(r.relativeDensity).toBeGreaterThanOrEqual(0.9);
    expect(r.warnings.length).toBe(1);
  });

  it("rejects D0 ∉ (0, 1), P ≤ 0, σ_y ≤ 0", () => {
    expect(() => hipRelativeDensity({ initialDensity: 1, pressureMPa: 100, yieldStrengthMPa: 30 })).toThrow(/initialDensity/);
    expect(() => hipRelativeDensity({ initialDensity: 0, pressureMPa: 100, yieldStrengthMPa: 30 })).toThrow(InputError);
    expect(() => hipRelativeDensity({ initialDensity: 0.64, pressureMPa: 0, yieldStrengthMPa: 30 })).toThrow(/pressureMPa/);
    expect(() => hipRelativeDensity({ initialDensity: 0.64, pressureMPa: 100, yieldStrengthMPa: -1 })).toThrow(/yieldStrengthMPa/);
    expect(() => hipLinearShrinkage(0.7, 0.6)).toThrow(/finalDensity/);
  });
});
