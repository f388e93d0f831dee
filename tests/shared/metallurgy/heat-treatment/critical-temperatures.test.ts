import { describe, expect, it } from "vitest";
import {
  a3TempC,
  ac1TempC,
  ac3TempC,
  acmTempC,
  austeniteCarbonOnAcmMassPct,
} from "../../../../shared/metallurgy/heat-treatment/critical-temperatures";
import { InputError } from "../../../../shared/metallurgy/errors";

describe("critical temperatures", () => {
  it("A3 matches the check values", () => {
    // [Computed] science-reference §5.2 check 3 (A3 = 910 − 203√C, Andrews form [Mem]): 819.2 / 781.6 / 752.8 / 731.9 °C, ±0.1
    const cases: [number, number][] = [
      [0.2, 819.2],
      [0.4, 781.6],
      [0.6, 752.8],
      [0.77, 731.9],
    ];
    for (const [c, t] of cases) expect(Math.abs(a3TempC(c) - t)).toBeLessThan(0.1);
    expect(a3TempC(0)).toBe(910);
  });

  it("Acm and carbon on the Acm line match the check values", () => {
    // [Computed] §5.2 check 4: Acm at 1.0 / 1.2 / 1.5 % C → 799.3 / 862.1 / 956.4 °C (±0.1); C_γ at 760 / 800 °C → 0.875 / 1.002 % (±0.001)
    expect(Math.abs(acmTempC(1.0) - 799.3)).toBeLessThan(0.1);
    expect(Math.abs(acmTempC(1.2) - 862.1)).toBeLessThan(0.1);
    expect(Math.abs(acmTempC(1.5) - 956.4)).toBeLessThan(0.1);
    expect(Math.abs(austeniteCarbonOnAcmMassPct(760) - 0.875)).toBeLessThan(0.001);
    expect(Math.abs(austeniteCarbonOnAcmMassPct(800) - 1.002)).toBeLessThan(0.001);
    // Ends on the ASM points (0.77, 727) and (2.11, 1148) [Checked]
    expect(acmTempC(0.77)).toBeCloseTo(727, 10);
    expect(acmTempC(2.11)).toBeCloseTo(1148, 10);
    expect(austeniteCarbonOnAcmMassPct(acmTempC(1.3))).toBeCloseTo(1.3, 12);
  });

  it("Ac1 and alloyed Ac3 follow the Andrews formulas", () => {
    // Andrews (1965) [Mem], science-reference §5.2: Ac1 = 723 − 10.7Mn − 16.9Ni + 29.1Si + 16.9Cr
    expect(ac1TempC({ C: 0.4, Mn: 0.8, Si: 0.25, Cr: 1 })).toBeCloseTo(723 - 8.56 + 7.275 + 16.9, 10);
    // Ac3 = 910 − 203√C − 15.2Ni + 44.7Si + 104V + 31.5Mo + 13.1W
    expect(ac3TempC({ C: 0.4, Si: 0.25, Mo: 0.2, Ni: 1 })).toBeCloseTo(910 - 203 * Math.sqrt(0.4) - 15.2 + 11.175 + 6.3, 10);
    expect(ac3TempC({ C: 0.4 })).toBeCloseTo(a3TempC(0.4), 12);
  });

  it("rejects the lines outside their carbon ranges", () => {
    // §5.2: A3 only for C ≤ 0.77, Acm only for 0.77–2.11
    expect(() => a3TempC(0.8)).toThrow(/carbonMassPct/);
    expect(() => a3TempC(-0.01)).toThrow(InputError);
    expect(() => acmTempC(0.7)).toThrow(/carbonMassPct/);
    expect(() => acmTempC(2.2)).toThrow(InputError);
    expect(() => austeniteCarbonOnAcmMassPct(700)).toThrow(/tempC/);
    expect(() => ac1TempC({ Mn: -1 })).toThrow(InputError);
  });
});
