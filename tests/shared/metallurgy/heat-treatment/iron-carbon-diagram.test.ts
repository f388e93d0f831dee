import { describe, expect, it } from "vitest";
import { eutectoidPhaseFractions, IRON_CARBON_POINTS } from "../../../../shared/metallurgy/heat-treatment/iron-carbon-diagram";
import { InputError } from "../../../../shared/metallurgy/errors";

describe("Fe–C diagram key points", () => {
  it("holds both data sets of science-reference §5.2", () => {
    // [Checked] Callister textbook values: eutectoid 0.76 %/727 °C, eutectic 4.30/1147, γ max 2.14/1147, α max 0.022/727, Fe3C 6.70
    const c = IRON_CARBON_POINTS.callister;
    expect([c.eutectoid.carbonMassPct, c.eutectoid.tempC]).toEqual([0.76, 727]);
    expect([c.eutectic.carbonMassPct, c.eutectic.tempC]).toEqual([4.3, 1147]);
    expect([c.maxCarbonInAustenite.carbonMassPct, c.maxCarbonInAustenite.tempC]).toEqual([2.14, 1147]);
    expect(c.maxCarbonInFerrite.carbonMassPct).toBe(0.022);
    expect(c.cementiteCarbonMassPct).toBe(6.7);
    expect([c.peritectic.carbonMassPct, c.peritectic.tempC]).toEqual([0.17, 1493]);
    // [Checked] ASM diagram: 0.77/727, 4.30/1148, 2.11/1148, Fe3C 6.67; 0.0218 % α max [Mem]
    const a = IRON_CARBON_POINTS.asm;
    expect([a.eutectoid.carbonMassPct, a.eutectoid.tempC]).toEqual([0.77, 727]);
    expect([a.eutectic.carbonMassPct, a.eutectic.tempC]).toEqual([4.3, 1148]);
    expect([a.maxCarbonInAustenite.carbonMassPct, a.maxCarbonInAustenite.tempC]).toEqual([2.11, 1148]);
    expect(a.maxCarbonInFerrite.carbonMassPct).toBe(0.0218);
    expect(a.cementiteCarbonMassPct).toBe(6.67);
    // [Checked] pure Fe: α→γ 912, γ→δ 1394, melting 1538 °C (both sets)
    for (const set of [a, c]) expect([set.alphaToGammaC, set.gammaToDeltaC, set.meltingC]).toEqual([912, 1394, 1538]);
  });

  it("cementite stoichiometry lies between the data sets' rounded values", () => {
    // [Computed] 6.69 % C in Fe3C = 12.011/(3·55.845 + 12.011)
    const stoich = (100 * 12.011) / (3 * 55.845 + 12.011);
    expect(stoich).toBeCloseTo(6.69, 2);
    expect(stoich).toBeGreaterThan(IRON_CARBON_POINTS.asm.cementiteCarbonMassPct);
    expect(stoich).toBeLessThan(IRON_CARBON_POINTS.callister.cementiteCarbonMassPct);
  });
});

describe("lever-rule phase fractions just below the eutectoid", () => {
  it("hypoeutectoid 0.35 % C (Callister points)", () => {
    // [Computed] §5.2 check 1: pearlite 0.4444, proeutectoid α 0.5556, total Fe3C 0.0491, ±1e-4
    const f = eutectoidPhaseFractions(0.35, "callister");
    expect(Math.abs(f.pearlite - 0.4444)).toBeLessThan(1e-4);
    expect(Math.abs(f.proeutectoidFerrite - 0.5556)).toBeLessThan(1e-4);
    expect(Math.abs(f.totalCementite - 0.0491)).toBeLessThan(1e-4);
    expect(f.proeutectoidCementite).toBe(0);
  });

  it("hypereutectoid 0.95 % C (Callister points)", () => {
    // [Computed] §5.2 check 2: pearlite 0.9680, proeutectoid Fe3C 0.0320, total Fe3C 0.1390, ±1e-4
    const f = eutectoidPhaseFractions(0.95);
    expect(Math.abs(f.pearlite - 0.968)).toBeLessThan(1e-4);
    expect(Math.abs(f.proeutectoidCementite - 0.032)).toBeLessThan(1e-4);
    expect(Math.abs(f.totalCementite - 0.139)).toBeLessThan(1e-4);
    expect(f.totalFerrite + f.totalCementite).toBeCloseTo(1, 14);
  });

  it("ASM points shift the fractions and the eutectoid composition is all pearlite", () => {
    // Lever rule with the ASM set: pearlite = (0.35 − 0.0218)/(0.77 − 0.0218)
    expect(eutectoidPhaseFractions(0.35, "asm").pearlite).toBeCloseTo((0.35 - 0.0218) / (0.77 - 0.0218), 12);
    expect(eutectoidPhaseFractions(0.77, "asm").pearlite).toBeCloseTo(1, 12);
    expect(eutectoidPhaseFractions(0.76, "callister").pearlite).toBeCloseTo(1, 12);
    expect(eutectoidPhaseFractions(0.01).pearlite).toBe(0);
    expect(eutectoidPhaseFractions(0.01).totalCementite).toBe(0);
    expect(eutectoidPhaseFractions(6.7).totalCementite).toBeCloseTo(1, 12);
    expect(eutectoidPhaseFractions(3).warnings.join(" ")).toMatch(/cast-iron/);
  });

  it("rejects C < 0, C above cementite and unknown data sets", () => {
    expect(() => eutectoidPhaseFractions(-0.1)).toThrow(InputError);
    expect(() => eutectoidPhaseFractions(6.8)).toThrow(/carbonMassPct/);
    expect(() => eutectoidPhaseFractions(6.69, "asm")).toThrow(/carbonMassPct/);
    expect(() => eutectoidPhaseFractions(0.5, "other" as never)).toThrow(/dataset/);
  });
});
