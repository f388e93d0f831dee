import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { DROPLET_DEFAULTS, dropletCooling, type DropletCoolingInput } from "../../../../shared/metallurgy/powder/droplet-cooling";
import { InputError } from "../../../../shared/metallurgy/errors";

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
// Check cases: T_d 1773.15 K, T_g 300 K (film 1036.65 K), ρc = 7000·800 (science-reference §4.2 defaults [Mem])
const base = { dropletTempK: 1773.15, gasTempK: 300 };

describe("droplet cooling (lumped capacitance + Ranz–Marshall)", () => {
  it("uses the liquid-steel defaults of the reference", () => {
    // [Mem] science-reference §4.2: ρ 7000 kg/m³, c 800 J/kgK, k_s 30 W/mK, L_f 2.7e5 J/kg; T_f 1480 °C (check 2)
    expect(DROPLET_DEFAULTS).toMatchObject({ liquidDensityKgPerM3: 7000, liquidHeatCapacityJPerKgK: 800, solidConductivityWPerMK: 30, latentHeatJPerKg: 2.7e5 });
    expect(DROPLET_DEFAULTS.freezingTempK).toBeCloseTo(1480 + 273.15, 10);
  });

  it("N2, 50 µm, still gas", () => {
    // [Computed] §4.2 check 1 (Ranz & Marshall 1952; NIST properties via CoolProp): Re 0, Nu 2.0000, h 2684.0, dT/dt 8.473e4, ±0.1 %
    const r = dropletCooling({ gas: "N2", diameterM: 50e-6, relativeVelocityMPerS: 0, ...base });
    expect(r.reynolds).toBe(0);
    expect(r.nusselt).toBe(2);
    expect(rel(r.heatTransferWPerM2K, 2684.0)).toBeLessThan(1e-3);
    expect(rel(r.coolingRateKPerS, 8.473e4)).toBeLessThan(1e-3);
    // (1773.15 + 300)/2 = 1036.575 K; the reference prints 1036.65 K (i.e. T_g = 300.15 K) — the
    // 0.075 K difference moves the gas properties by < 1e-4 relative, well inside the ±0.1 % checks.
    expect(r.filmTempK).toBeCloseTo(1036.575, 10);
  });

  it("N2, 50 µm, 20 m/s, with the freezing time", () => {
    // [Computed] §4.2 check 2: Re 7.742, Nu 3.5131, h 4714.6, dT/dt 1.4883e5, t_s (T_f 1480 °C) 2.299 ms, ±0.1 %
    const r = dropletCooling({ gas: "N2", diameterM: 50e-6, relativeVelocityMPerS: 20, ...base });
    expect(rel(r.reynolds, 7.742)).toBeLessThan(1e-3);
    expect(rel(r.nusselt, 3.5131)).toBeLessThan(1e-3);
    expect(rel(r.heatTransferWPerM2K, 4714.6)).toBeLessThan(1e-3);
    expect(rel(r.coolingRateKPerS, 1.4883e5)).toBeLessThan(1e-3);
    expect(rel(r.freezeTimeS, 2.299e-3)).toBeLessThan(1e-3);
    // [Computed] §4.2 check 5: Biot (k_s 30) 1.31e-3 ±1 %
    expect(rel(r.biot, 1.31e-3)).toBeLessThan(0.01);
    expect(r.warnings).toEqual([]);
  });

  it("other sizes and speeds", () => {
    // [Computed] §4.2 check 3: N2 100 µm/20 m/s 4.3845e4; 200 µm/20 m/s 1.3308e4; 20 µm/100 m/s 1.0961e6 K/s, ±0.1 %
    const cases: [number, number, number][] = [
      [100e-6, 20, 4.3845e4],
      [200e-6, 20, 1.3308e4],
      [20e-6, 100, 1.0961e6],
    ];
    for (const [d, v, rate] of cases) {
      expect(rel(dropletCooling({ gas: "N2", diameterM: d, relativeVelocityMPerS: v, ...base }).coolingRateKPerS, rate)).toBeLessThan(1e-3);
    }
  });

  it("argon, 50 µm, 20 m/s", () => {
    // [Computed] §4.2 check 4: Re 8.231, Nu 3.5026, h 3126.9, dT/dt 9.8707e4, ±0.1 %
    const r = dropletCooling({ gas: "Ar", diameterM: 50e-6, relativeVelocityMPerS: 20, ...base });
    expect(rel(r.reynolds, 8.231)).toBeLessThan(1e-3);
    expect(rel(r.nusselt, 3.5026)).toBeLessThan(1e-3);
    expect(rel(r.heatTransferWPerM2K, 3126.9)).toBeLessThan(1e-3);
    expect(rel(r.coolingRateKPerS, 9.8707e4)).toBeLessThan(1e-3);
  });

  it("adds radiation when an emissivity is given", () => {
    // h_r = εσ(T_d² + T_g²)(T_d + T_g) ≈ 150 W/m²K at ε 0.4, 1500 °C (science-reference §4.2)
    const r = dropletCooling({ gas: "N2", diameterM: 50e-6, relativeVelocityMPerS: 20, ...base, emissivity: 0.4 });
    expect(r.radiativeHeatTransferWPerM2K).toBeGreaterThan(140);
    expect(r.radiativeHeatTransferWPerM2K).toBeLessThan(160);
    const noRad = dropletCooling({ gas: "N2", diameterM: 50e-6, relativeVelocityMPerS: 20, ...base });
    expect(r.coolingRateKPerS / noRad.coolingRateKPerS).toBeCloseTo((r.heatTransferWPerM2K + r.radiativeHeatTransferWPerM2K) / r.heatTransferWPerM2K, 12);
  });

  it("cooling rate falls as the droplet diameter grows (property)", () => {
    // Issue #3 property: h/d ∝ (2 + 0.6·√Re·Pr^⅓)/d² decreases with d at fixed speed.
    fc.assert(
      fc.property(
        fc.constantFrom<"N2" | "Ar">("N2", "Ar"),
        fc.double({ min: 1e-6, max: 1e-3, noNaN: true }),
        fc.double({ min: 1e-6, max: 1e-3, noNaN: true }),
        fc.double({ min: 0, max: 300, noNaN: true }),
        (gas, a, b, v) => {
          fc.pre(Math.abs(a - b) > 1e-9);
          const [small, large] = a < b ? [a, b] : [b, a];
          const input = (d: number): DropletCoolingInput => ({ gas, diameterM: d, relativeVelocityMPerS: v, ...base });
          expect(dropletCooling(input(large)).coolingRateKPerS).toBeLessThan(dropletCooling(input(small)).coolingRateKPerS);
          expect(dropletCooling(input(large)).freezeTimeS).toBeGreaterThan(dropletCooling(input(small)).freezeTimeS);
        },
      ),
    );
  });

  it("warns outside the model's range", () => {
    expect(dropletCooling({ gas: "N2", diameterM: 800e-6, relativeVelocityMPerS: 20, ...base }).warnings.join(" ")).toMatch(/500 µm/);
    expect(dropletCooling({ gas: "N2", diameterM: 1e-3, relativeVelocityMPerS: 300, dropletTempK: 400, gasTempK: 300 }).warnings.join(" ")).toMatch(/Re =/);
    const bigBiot = dropletCooling({ gas: "N2", diameterM: 50e-6, relativeVelocityMPerS: 20, ...base, solidConductivityWPerMK: 0.3 });
    expect(bigBiot.warnings.join(" ")).toMatch(/Biot/);
  });

  it("rejects invalid input", () => {
    expect(() => dropletCooling({ gas: "N2", diameterM: 0, relativeVelocityMPerS: 20, ...base })).toThrow(/diameterM/);
    expect(() => dropletCooling({ gas: "N2", diameterM: 2e-3, relativeVelocityMPerS: 20, ...base })).toThrow(InputError);
    expect(() => dropletCooling({ gas: "N2", diameterM: 5e-5, relativeVelocityMPerS: -1, ...base })).toThrow(/relativeVelocity/);
    expect(() => dropletCooling({ gas: "N2", diameterM: 5e-5, relativeVelocityMPerS: 1, dropletTempK: 300, gasTempK: 300 })).toThrow(/dropletTempK/);
    expect(() => dropletCooling({ gas: "N2", diameterM: 5e-5, relativeVelocityMPerS: 1, dropletTempK: 3400, gasTempK: 1000 })).toThrow(/film temperature/);
    expect(() => dropletCooling({ gas: "Xe" as never, diameterM: 5e-5, relativeVelocityMPerS: 1, ...base })).toThrow(/gas/);
  });
});
