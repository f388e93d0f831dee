import { describe, expect, it } from "vitest";
import {
  ironCarbonEffectivePartitionCoefficient,
  ironCarbonFreezingRangeC,
  ironCarbonLiquidusTempC,
  ironCarbonSolidusTempC,
} from "../../../../shared/metallurgy/solidification/iron-carbon-binary";
import { InputError } from "../../../../shared/metallurgy/errors";

describe("binary Fe–C liquidus and solidus (ASM points)", () => {
  it("matches the check values", () => {
    // [Computed] science-reference §3.3 check 3 (ASM diagram points [Mem]), ±0.1 °C
    const cases: [number, number, number, number][] = [
      [0.5, 1497.4, 1436.0, 61.5],
      [0.8, 1470.1, 1382.3, 87.8],
      [1.0, 1451.7, 1346.5, 105.2],
      [1.5, 1405.7, 1257.1, 148.6],
    ];
    for (const [c, tl, ts, range] of cases) {
      expect(Math.abs(ironCarbonLiquidusTempC(c) - tl)).toBeLessThan(0.1);
      expect(Math.abs(ironCarbonSolidusTempC(c) - ts)).toBeLessThan(0.1);
      expect(Math.abs(ironCarbonFreezingRangeC(c) - range)).toBeLessThan(0.1);
    }
    // [Computed] §3.3 check 4: C 0.1 → T_L 1529.9, T_S 1495.0 (peritectic isotherm) ±0.1
    expect(Math.abs(ironCarbonLiquidusTempC(0.1) - 1529.9)).toBeLessThan(0.1);
    expect(Math.abs(ironCarbonSolidusTempC(0.1) - 1495.0)).toBeLessThan(0.1);
  });

  it("passes through the key points and gives k ≈ 0.515", () => {
    // ASM points [Mem]: Fe melts 1538; peritectic 1495 (L 0.53); eutectic 1148 (γ 2.11, L 4.30)
    expect(ironCarbonLiquidusTempC(0)).toBe(1538);
    expect(ironCarbonSolidusTempC(0)).toBe(1538);
    expect(ironCarbonLiquidusTempC(0.53)).toBeCloseTo(1495, 10);
    expect(ironCarbonLiquidusTempC(4.3)).toBeCloseTo(1148, 10);
    expect(ironCarbonSolidusTempC(2.11)).toBeCloseTo(1148, 10);
    expect(ironCarbonSolidusTempC(3.0)).toBe(1148);
    // [Computed] §3.3: effective k from the slopes = 0.515
    expect(Math.abs(ironCarbonEffectivePartitionCoefficient() - 0.515)).toBeLessThan(5e-4);
  });

  it("rejects C outside 0–4.30 %", () => {
    expect(() => ironCarbonLiquidusTempC(-0.01)).toThrow(InputError);
    expect(() => ironCarbonSolidusTempC(4.5)).toThrow(/carbonMassPct/);
  });
});
