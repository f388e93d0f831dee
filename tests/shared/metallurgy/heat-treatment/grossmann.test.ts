import { describe, expect, it } from "vitest";
import { idealCriticalDiameterIn } from "../../../../shared/metallurgy/heat-treatment/grossmann";
import { InputError } from "../../../../shared/metallurgy/errors";

describe("Grossmann ideal critical diameter (ASTM A255 factors)", () => {
  it("SAE 4118 mod worked example", () => {
    // [Computed]/[Checked] science-reference §5.3 check 1 (ASTM A255-10(2014) factors, public reproduction):
    // C 0.22, Mn 0.80, Si 0.18, Ni 0.10, Cr 0.43, Mo 0.25, Cu 0.10, V 0.05 → 1.932 in (1.95 printed with rounded factors), ±0.02
    const r = idealCriticalDiameterIn({ C: 0.22, Mn: 0.8, Si: 0.18, Ni: 0.1, Cr: 0.43, Mo: 0.25, Cu: 0.1, V: 0.05 });
    expect(Math.abs(r.value - 1.932)).toBeLessThan(0.02);
    expect(r.valueMm).toBeCloseTo(r.value * 25.4, 12);
    expect(r.factors.C).toBeCloseTo(0.54 * 0.22, 12);
    expect(r.warnings).toEqual([]);
  });

  it("plain carbon and low-alloy types", () => {
    // [Computed] §5.3 checks 2–4, ±0.005 in
    expect(Math.abs(idealCriticalDiameterIn({ C: 0.45, Mn: 0.75, Si: 0.25 }).value - 0.926)).toBeLessThan(0.005); // 1045-type
    expect(Math.abs(idealCriticalDiameterIn({ C: 0.4, Mn: 0.875, Si: 0.25, Cr: 0.95, Mo: 0.2 }).value - 4.805)).toBeLessThan(0.005); // 4140-type
    expect(Math.abs(idealCriticalDiameterIn({ C: 0.6, Mn: 0.875, Si: 0.25, Cr: 0.8 }).value - 3.291)).toBeLessThan(0.005); // 5160-type
    const r1080 = idealCriticalDiameterIn({ C: 0.8, Mn: 0.75, Si: 0.25 }); // 1080-type
    expect(Math.abs(r1080.value - 1.245)).toBeLessThan(0.005);
    // C 0.80 is inside the factor table but outside A255's calculation range 0.10–0.70 % (A255-10(2014) §1.3) → warn
    expect(r1080.warnings.join(" ")).toMatch(/C = 0.8/);
  });

  it("rejects compositions outside the factor ranges, naming the element and range", () => {
    // [Checked] §5.3 check 5: C 0.95 → reject (outside the carbon table)
    expect(() => idealCriticalDiameterIn({ C: 0.95, Mn: 0.4 })).toThrow(InputError);
    expect(() => idealCriticalDiameterIn({ C: 0.95, Mn: 0.4 })).toThrow(/composition\.C = 0\.95.*0\.01–0\.9/);
    expect(() => idealCriticalDiameterIn({ C: 1.075, Cr: 17, Mo: 0.5 })).toThrow(/composition\.C/);
    expect(() => idealCriticalDiameterIn({ C: 0.5, Cr: 5 })).toThrow(/composition\.Cr = 5.*0–2\.5/);
    expect(() => idealCriticalDiameterIn({ C: 0.5, V: 0.3 })).toThrow(/composition\.V/);
    expect(() => idealCriticalDiameterIn({ C: 0.5, Ni: 2 })).toThrow(/composition\.Ni/);
    expect(() => idealCriticalDiameterIn({ C: 0.005 })).toThrow(/composition\.C/);
  });

  it("uses the high-Mn branch continuously at 1.20 %", () => {
    // f_Mn = 1 + 3.3333Mn (≤ 1.20) and 5.10Mn − 1.12 (1.20–1.95) meet at 5.0
    const lo = idealCriticalDiameterIn({ C: 0.4, Mn: 1.2 }).factors.Mn;
    const hi = idealCriticalDiameterIn({ C: 0.4, Mn: 1.2000001 }).factors.Mn;
    expect(Math.abs(lo - hi)).toBeLessThan(1e-4);
    expect(idealCriticalDiameterIn({ C: 0.4, Mn: 1.95 }).factors.Mn).toBeCloseTo(5.1 * 1.95 - 1.12, 12);
  });
});
