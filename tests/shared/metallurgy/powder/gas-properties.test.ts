import { describe, expect, it } from "vitest";
import { GAS_PROPERTIES_1ATM, gasProperties } from "../../../../shared/metallurgy/powder/gas-properties";
import { InputError } from "../../../../shared/metallurgy/errors";

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe("gas properties of N2 and Ar at 1 atm", () => {
  it("reproduces the table of science-reference §4.2 at its temperatures", () => {
    // [Computed] §4.2 table (NIST equations via CoolProp 8.0.0), values as printed (rounded): tolerance 0.1 %
    const rows: [("N2" | "Ar"), number, number, number, number, number, number][] = [
      ["N2", 300, 1.1382, 1041.4, 0.02597, 1.789e-5, 0.717],
      ["N2", 600, 0.5687, 1075.1, 0.04484, 2.958e-5, 0.709],
      ["N2", 1000, 0.3413, 1167.4, 0.06536, 4.154e-5, 0.742],
      ["N2", 1500, 0.2275, 1243.9, 0.08801, 5.407e-5, 0.764],
      ["Ar", 300, 1.6238, 521.5, 0.01784, 2.274e-5, 0.665],
      ["Ar", 600, 0.8112, 520.6, 0.03057, 3.9e-5, 0.664],
      ["Ar", 1000, 0.4867, 520.4, 0.04358, 5.569e-5, 0.665],
      ["Ar", 1500, 0.3245, 520.4, 0.05682, 7.275e-5, 0.666],
    ];
    for (const [gas, t, rho, cp, k, mu, pr] of rows) {
      const g = gasProperties(gas, t);
      expect(rel(g.densityKgPerM3, rho)).toBeLessThan(1e-3);
      expect(rel(g.heatCapacityJPerKgK, cp)).toBeLessThan(1e-3);
      expect(rel(g.conductivityWPerMK, k)).toBeLessThan(1e-3);
      expect(rel(g.viscosityPaS, mu)).toBeLessThan(1e-3);
      expect(rel(g.prandtl, pr)).toBeLessThan(1e-3);
    }
  });

  it("interpolates to the film-temperature values of the reference (1036.65 K)", () => {
    // [Computed] §4.2: N2 ρ 0.32921, c_p 1174.8, k 0.067104, µ 4.2528e-5; Ar ρ 0.46950, c_p 520.40, k 0.044639, µ 5.7046e-5.
    // Linear interpolation in T (ρ·T for density) stays within 0.05 % of the reference equation.
    const n2 = gasProperties("N2", 1036.65);
    expect(rel(n2.densityKgPerM3, 0.32921)).toBeLessThan(5e-4);
    expect(rel(n2.heatCapacityJPerKgK, 1174.8)).toBeLessThan(5e-4);
    expect(rel(n2.conductivityWPerMK, 0.067104)).toBeLessThan(5e-4);
    expect(rel(n2.viscosityPaS, 4.2528e-5)).toBeLessThan(5e-4);
    const ar = gasProperties("Ar", 1036.65);
    expect(rel(ar.densityKgPerM3, 0.4695)).toBeLessThan(5e-4);
    expect(rel(ar.heatCapacityJPerKgK, 520.4)).toBeLessThan(5e-4);
    expect(rel(ar.conductivityWPerMK, 0.044639)).toBeLessThan(5e-4);
    expect(rel(ar.viscosityPaS, 5.7046e-5)).toBeLessThan(5e-4);
  });

  it("returns the table rows exactly at the nodes and covers 300–2000 K", () => {
    for (const row of GAS_PROPERTIES_1ATM) {
      const g = gasProperties(row.gas, row.tempK);
      expect(g.heatCapacityJPerKgK).toBe(row.heatCapacityJPerKgK);
      expect(g.viscosityPaS).toBe(row.viscosityPaS);
      expect(g.densityKgPerM3).toBeCloseTo(row.densityKgPerM3, 12);
      expect(rel(g.prandtl, row.prandtl)).toBeLessThan(2e-4); // the table's Pr is rounded to 4 digits
    }
    expect(gasProperties("N2", 2000).conductivityWPerMK).toBe(0.10931);
  });

  it("rejects temperatures outside 300–2000 K and unknown gases", () => {
    expect(() => gasProperties("N2", 299.9)).toThrow(InputError);
    expect(() => gasProperties("Ar", 2000.1)).toThrow(/tempK/);
    expect(() => gasProperties("He" as never, 1000)).toThrow(/gas/);
  });
});
