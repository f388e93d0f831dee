import { describe, expect, it } from "vitest";
import { effectiveHeatCapacityJPerKgK, explicitStableTimeStepS } from "../../../../shared/metallurgy/solidification/conduction-stability";
import { InputError } from "../../../../shared/metallurgy/errors";

describe("explicit conduction stability and effective heat capacity", () => {
  it("gives the stable time steps of the check", () => {
    // [Computed] science-reference §3.6 check 3 (criteria: Incropera & DeWitt [Pub, mem]):
    // α = 5.962e-6 m²/s (k 30, ρ 7400, c 680), Δx 5 mm → 2.097 s; with h 1000 W/m²K (Bi 0.1667) → 1.797 s, ±0.002
    const alpha = 30 / (7400 * 680);
    expect(Math.abs(alpha - 5.962e-6)).toBeLessThan(1e-9);
    expect(Math.abs(explicitStableTimeStepS({ diffusivityM2PerS: alpha, cellSizeM: 0.005 }) - 2.097)).toBeLessThan(0.002);
    const wall = explicitStableTimeStepS({ diffusivityM2PerS: alpha, cellSizeM: 0.005, heatTransferWPerM2K: 1000, conductivityWPerMK: 30 });
    expect(Math.abs(wall - 1.797)).toBeLessThan(0.002);
  });

  it("gives c_eff for the freezing range", () => {
    // [Computed] §3.6 check 4: c 680, L_f 2.7e5, T_L 1450, T_S 1350 → 3380 J/kg·K exactly
    expect(effectiveHeatCapacityJPerKgK(680, 2.7e5, 1450, 1350)).toBe(3380);
  });

  it("rejects T_L ≤ T_S and missing conductivity", () => {
    expect(() => effectiveHeatCapacityJPerKgK(680, 2.7e5, 1400, 1400)).toThrow(/solidusC/);
    expect(() => explicitStableTimeStepS({ diffusivityM2PerS: 1e-5, cellSizeM: 0.01, heatTransferWPerM2K: 100 })).toThrow(InputError);
    expect(() => explicitStableTimeStepS({ diffusivityM2PerS: 0, cellSizeM: 0.01 })).toThrow(/diffusivity/);
  });
});
