import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  equivalentTemperingHours,
  temperingConstantForCarbon,
  temperingParameter,
} from "../../../../shared/metallurgy/heat-treatment/tempering-parameter";
import { InputError } from "../../../../shared/metallurgy/errors";

describe("Hollomon–Jaffe tempering parameter", () => {
  it("matches the check values", () => {
    // [Computed] science-reference §5.1 check 1 (Hollomon & Jaffe 1945; engineering form, hours, C = 20 [Checked]):
    // 200 °C, 2 h → P = 9605.43 ±0.01
    const p = temperingParameter(200, 2);
    expect(Math.abs(p.value - 9605.43)).toBeLessThan(0.01);
    expect(p.warnings).toEqual([]);
    // [Computed] §5.1 check 2: same P at 220 °C → 0.3004 h (±0.001 h); at 180 °C → 15.74 h (±0.01 h)
    expect(Math.abs(equivalentTemperingHours(p.value, 220).value - 0.3004)).toBeLessThan(0.001);
    expect(Math.abs(equivalentTemperingHours(p.value, 180).value - 15.74)).toBeLessThan(0.01);
  });

  it("uses hours, not minutes (time unit and constant are fixed together)", () => {
    // §5.1: the minutes/1000 variant must not sneak in: 2 h must differ from "120" units.
    expect(temperingParameter(200, 120).value).not.toBeCloseTo(temperingParameter(200, 2).value, 0);
    expect(temperingParameter(200, 1).value).toBeCloseTo(473.15 * 20, 10);
  });

  it("carbon-dependent constant", () => {
    // [Computed] §5.1 check 3: C(0.2), C(0.8), C(1.0) = 20.14, 16.66, 15.50 (exact) — C = 21.3 − 5.8·C [Checked]
    expect(temperingConstantForCarbon(0.2)).toBeCloseTo(20.14, 12);
    expect(temperingConstantForCarbon(0.8)).toBeCloseTo(16.66, 12);
    expect(temperingConstantForCarbon(1.0)).toBeCloseTo(15.5, 12);
    // [Computed] §5.1 check 4: 1.0 % C, 177 °C, 2 h → P 7112.83 (±0.01); equivalent time at 204 °C 0.2552 h (±1e-4)
    const c = temperingConstantForCarbon(1.0);
    const p = temperingParameter(177, 2, c).value;
    expect(Math.abs(p - 7112.83)).toBeLessThan(0.01);
    expect(Math.abs(equivalentTemperingHours(p, 204, c).value - 0.2552)).toBeLessThan(1e-4);
  });

  it("round-trips: equivalent time at the same temperature returns the original time (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 100, max: 700, noNaN: true }),
        fc.double({ min: 1e-3, max: 1e3, noNaN: true }),
        fc.double({ min: 10, max: 25, noNaN: true }),
        fc.double({ min: 100, max: 700, noNaN: true }),
        (tempC, hours, constant, otherC) => {
          const p = temperingParameter(tempC, hours, constant).value;
          expect(Math.abs(equivalentTemperingHours(p, tempC, constant).value / hours - 1)).toBeLessThan(1e-9);
          // and via another temperature and back
          const t2 = equivalentTemperingHours(p, otherC, constant).value;
          const p2 = temperingParameter(otherC, t2, constant).value;
          expect(Math.abs(p2 / p - 1)).toBeLessThan(1e-12);
        },
      ),
    );
  });

  it("warns outside 100–700 °C and rejects t ≤ 0, T ≤ 0 K", () => {
    expect(temperingParameter(750, 1).warnings.join(" ")).toMatch(/100–700/);
    expect(equivalentTemperingHours(9000, 50).warnings.length).toBe(1);
    expect(() => temperingParameter(200, 0)).toThrow(/hours/);
    expect(() => temperingParameter(-273.15, 1)).toThrow(InputError);
    expect(() => temperingParameter(200, 1, 0)).toThrow(/constant/);
    expect(() => equivalentTemperingHours(0, 200)).toThrow(/parameter/);
    expect(() => equivalentTemperingHours(1e6, 1)).toThrow(/finite/);
    expect(() => temperingConstantForCarbon(-0.1)).toThrow(/carbonMassPct/);
  });
});
