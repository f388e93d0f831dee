import { describe, expect, it } from "vitest";
import { erf, erfc } from "../../../../shared/metallurgy/solidification/erf";

describe("erf / erfc (Cody 1969 rational approximations)", () => {
  it("matches the science-reference check values", () => {
    // [Computed] science-reference §3.6 check 2: erf(0.5) = 0.520500, erf(1.0) = 0.842701, ±1e-6
    expect(Math.abs(erf(0.5) - 0.5205)).toBeLessThan(1e-6);
    expect(Math.abs(erf(1.0) - 0.842701)).toBeLessThan(1e-6);
  });

  it("matches Abramowitz & Stegun Table 7.1 to 1e-9", () => {
    // Abramowitz & Stegun (1964), Handbook of Mathematical Functions, Table 7.1 (erf x, 10+ decimals)
    const table: [number, number][] = [
      [0.1, 0.1124629160],
      [0.25, 0.2763263902],
      [0.5, 0.5204998778],
      [0.75, 0.7111556337],
      [1.0, 0.8427007929],
      [1.25, 0.9229001283],
      [1.5, 0.9661051465],
      [1.75, 0.9866716712],
      [2.0, 0.9953222650],
    ];
    for (const [x, value] of table) {
      expect(Math.abs(erf(x) - value)).toBeLessThan(1e-9);
      expect(Math.abs(erf(-x) + value)).toBeLessThan(1e-9); // erf is odd
    }
  });

  it("keeps relative precision in the far tail of erfc", () => {
    // erfc(5) = 1.5374597944280351e-12 and erfc(10) = 2.088487583762545e-45 (A&S 7.1 asymptotics;
    // values as given by any IEEE erfc, e.g. C99 / Python math.erfc)
    expect(Math.abs(erfc(5) / 1.5374597944280351e-12 - 1)).toBeLessThan(1e-13);
    expect(Math.abs(erfc(10) / 2.088487583762545e-45 - 1)).toBeLessThan(1e-13);
    expect(erfc(-3)).toBeCloseTo(2 - erfc(3), 15);
    expect(erfc(30)).toBe(0);
    expect(erf(0)).toBe(0);
    expect(erf(Infinity)).toBe(1);
    expect(erf(-Infinity)).toBe(-1);
  });

  it("is continuous at the interval breaks 0.46875 and 4", () => {
    for (const x of [0.46875, 4]) {
      expect(Math.abs(erf(x + 1e-12) - erf(x - 1e-12))).toBeLessThan(1e-11);
      expect(Math.abs(erfc(x + 1e-12) - erfc(x - 1e-12))).toBeLessThan(1e-11);
    }
  });
});
