import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { ironMassPct } from "@shared/metallurgy/composition";
import { InfeasibleError, InputError } from "@shared/metallurgy/errors";
import { allocateCarbides, type CarbideAllocation, type CarbideType } from "@shared/metallurgy/carbides";

const within = (actual: number, expected: number, tol: number) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tol);
const phase = (a: CarbideAllocation, t: CarbideType) => {
  const p = a.phases.find((x) => x.type === t);
  if (!p) throw new Error(`no ${t}`);
  return p;
};

describe("allocateCarbides (model CARB-1, science-reference §2.2)", () => {
  it("1095-type: M3C 14.20 wt%, 14.45 vol% (check 1)", () => {
    const a = allocateCarbides({ C: 0.95 });
    within(phase(a, "M3C").massPct, 14.2, 0.05); // [Computed] §2.2 check 1; model CARB-1
    within(phase(a, "M3C").volumePct, 14.45, 0.05); // [Computed] §2.2 check 1; model CARB-1
    expect(a.phases).toHaveLength(1);
  });

  it("52100-type: M3C 14.89 wt%, 15.20 vol%, y3 = 0.063, matrix Cr 0.745 (check 2)", () => {
    const a = allocateCarbides({ C: 1.0, Cr: 1.45 });
    within(phase(a, "M3C").massPct, 14.89, 0.05); // [Computed] §2.2 check 2; model CARB-1
    within(phase(a, "M3C").volumePct, 15.2, 0.05); // [Computed] §2.2 check 2
    within(phase(a, "M3C").chromiumShare!, 0.063, 0.0005); // [Computed] §2.2 check 2 (stated to 3 decimals)
    within(a.matrix.chromiumMassPct, 0.745, 0.05); // [Computed] §2.2 check 2
  });

  it("420-type: M23C6 5.39 wt%, 5.91 vol%, matrix Cr 10.06 (check 3)", () => {
    const a = allocateCarbides({ C: 0.3, Cr: 13 });
    within(phase(a, "M23C6").massPct, 5.39, 0.05); // [Computed] §2.2 check 3; model CARB-1
    within(phase(a, "M23C6").volumePct, 5.91, 0.05); // [Computed] §2.2 check 3
    within(a.matrix.chromiumMassPct, 10.06, 0.05); // [Computed] §2.2 check 3
  });

  it("440C-type: M7C3 12.34 wt%, 13.38 vol%, matrix Cr 13.20; pure Cr7C3 leaves 6.97 (check 4)", () => {
    const a = allocateCarbides({ C: 1.075, Cr: 17, Mo: 0.5 });
    within(phase(a, "M7C3").massPct, 12.34, 0.05); // [Computed] §2.2 check 4; model CARB-1
    within(phase(a, "M7C3").volumePct, 13.38, 0.05); // [Computed] §2.2 check 4
    within(a.matrix.chromiumMassPct, 13.2, 0.05); // [Computed] §2.2 check 4
    const pure = allocateCarbides({ C: 1.075, Cr: 17, Mo: 0.5 }, { m7c3ChromiumShare: 1 });
    within(pure.matrix.chromiumMassPct, 6.97, 0.05); // [Computed] §2.2 check 4, y7 = 1
    expect(a.matrix.molybdenumMassPct).toBeGreaterThan(0.5); // W + 2Mo < 4: Mo stays in the matrix
  });

  it("D2-type: MC 1.09/1.48, M7C3 15.66/16.85, total 18.34 vol%, matrix Cr 5.54 (check 5)", () => {
    const a = allocateCarbides({ C: 1.55, Cr: 11.5, Mo: 0.8, V: 0.9 });
    within(phase(a, "MC").massPct, 1.09, 0.05); // [Computed] §2.2 check 5; model CARB-1
    within(phase(a, "MC").volumePct, 1.48, 0.05); // [Computed] §2.2 check 5
    within(phase(a, "M7C3").massPct, 15.66, 0.05); // [Computed] §2.2 check 5
    within(phase(a, "M7C3").volumePct, 16.85, 0.05); // [Computed] §2.2 check 5
    within(a.totalCarbideVolumePct, 18.34, 0.05); // [Computed] §2.2 check 5
    within(a.matrix.chromiumMassPct, 5.54, 0.05); // [Computed] §2.2 check 5
  });

  it("M2-type: MC 2.29/3.32, M6C 16.60/12.17, M23C6 1.98/2.27, total 17.75 vol% (check 6)", () => {
    const a = allocateCarbides({ C: 0.85, Cr: 4.1, Mo: 5.0, W: 6.4, V: 1.9 });
    within(phase(a, "MC").massPct, 2.29, 0.05); // [Computed] §2.2 check 6; model CARB-1
    within(phase(a, "MC").volumePct, 3.32, 0.05); // [Computed] §2.2 check 6
    within(phase(a, "M6C").massPct, 16.6, 0.05); // [Computed] §2.2 check 6
    within(phase(a, "M6C").volumePct, 12.17, 0.05); // [Computed] §2.2 check 6
    within(phase(a, "M23C6").massPct, 1.98, 0.05); // [Computed] §2.2 check 6
    within(phase(a, "M23C6").volumePct, 2.27, 0.05); // [Computed] §2.2 check 6
    within(a.totalCarbideVolumePct, 17.75, 0.05); // [Computed] §2.2 check 6
  });

  it("A11-type: MC 11.76/15.59, M7C3 5.03/5.25, total 20.85 vol% (check 7)", () => {
    const a = allocateCarbides({ C: 2.45, Cr: 5.25, Mo: 1.3, V: 9.75 });
    within(phase(a, "MC").massPct, 11.76, 0.05); // [Computed] §2.2 check 7; model CARB-1
    within(phase(a, "MC").volumePct, 15.59, 0.05); // [Computed] §2.2 check 7
    within(phase(a, "M7C3").massPct, 5.03, 0.05); // [Computed] §2.2 check 7
    within(phase(a, "M7C3").volumePct, 5.25, 0.05); // [Computed] §2.2 check 7
    within(a.totalCarbideVolumePct, 20.85, 0.05); // [Computed] §2.2 check 7
  });

  it("has no carbides without carbon", () => {
    const a = allocateCarbides({ Cr: 13, V: 1 });
    expect(a.phases).toEqual([]);
    expect(a.matrix.massPct).toBe(100);
    within(a.matrix.volumePct, 100, 1e-12);
  });

  it("binds nitrogen in MC before carbon", () => {
    const a = allocateCarbides({ C: 0.1, N: 0.2, V: 1 });
    const mc = phase(a, "MC");
    within(mc.elements.N, 0.2, 1e-12);
    within(mc.elements.N / 14.007 + mc.elements.C / 12.011, 0.875 * (mc.elements.V / 50.9415), 1e-12);
  });

  it("lowers the M7C3 Cr share when the Cr runs out, and warns", () => {
    const a = allocateCarbides({ C: 1.0, Cr: 4.0 }); // ratio 4: M7C3, but y7 = 0.5 would need 5.05 % Cr
    const m7 = phase(a, "M7C3");
    within(m7.elements.Cr, 4.0, 1e-9);
    within(m7.chromiumShare!, 4.0 / ((1 / 12.011 / 3) * 7 * 51.9961), 1e-9);
    expect(a.matrix.chromiumMassPct).toBeCloseTo(0, 12);
    expect(a.warnings.join(" ")).toMatch(/Cr share is lowered/);
  });

  it("warns outside its calibration: V > 15, Cr > 30, C > 2.5 (§2.2 valid inputs)", () => {
    expect(allocateCarbides({ C: 3.0, V: 16 }).warnings.join(" ")).toMatch(/V = 16/);
    expect(allocateCarbides({ C: 3.0, V: 16 }).warnings.join(" ")).toMatch(/C = 3/);
    expect(allocateCarbides({ C: 1, Cr: 31 }).warnings.join(" ")).toMatch(/Cr = 31/);
    expect(allocateCarbides({ C: 1, Cr: 17 }).warnings).toEqual([]);
  });

  it("rejects the cast-iron range and bad compositions with InputError", () => {
    expect(() => allocateCarbides({ C: 3.6 })).toThrow(InputError);
    expect(() => allocateCarbides({ C: -0.1 })).toThrow(InputError);
    expect(() => allocateCarbides({ C: Number.NaN })).toThrow(InputError);
    expect(() => allocateCarbides({ C: 1, Cr: 60, W: 45 })).toThrow(InputError);
    expect(() => allocateCarbides({ C: 1 }, { m7c3ChromiumShare: 0 })).toThrow(InputError);
    expect(() => allocateCarbides({ C: 1 }, { matrixDensityGPerCm3: -1 })).toThrow(InputError);
  });

  const steel = fc.record({
    C: fc.double({ min: 0, max: 3.5, noNaN: true }),
    Cr: fc.double({ min: 0, max: 30, noNaN: true }),
    V: fc.double({ min: 0, max: 15, noNaN: true }),
    Mo: fc.double({ min: 0, max: 10, noNaN: true }),
    W: fc.double({ min: 0, max: 18, noNaN: true }),
    N: fc.double({ min: 0, max: 0.5, noNaN: true }),
    Mn: fc.double({ min: 0, max: 2, noNaN: true }),
  });

  it("conserves the mass of every element and of the alloy", () => {
    fc.assert(
      fc.property(steel, (comp) => {
        let a: CarbideAllocation;
        try {
          a = allocateCarbides(comp);
        } catch (e) {
          // extreme random alloys may lack the iron a carbide needs: a typed refusal, never a wrong balance
          expect(e).toBeInstanceOf(InfeasibleError);
          expect((e as InfeasibleError).reason).toBe("insufficient-iron");
          return;
        }
        for (const el of ["C", "Cr", "V", "Mo", "W", "N"] as const) {
          const inCarbides = a.phases.reduce((s, p) => s + p.elements[el], 0);
          within(inCarbides + (a.matrix.composition[el] * a.matrix.massPct) / 100, comp[el], 1e-9);
        }
        const feCarbides = a.phases.reduce((s, p) => s + p.elements.Fe, 0);
        within(feCarbides + (ironMassPct(a.matrix.composition) * a.matrix.massPct) / 100, ironMassPct(comp), 1e-9);
        within(a.phases.reduce((s, p) => s + p.massPct, 0) + a.matrix.massPct, 100, 1e-9);
        within(a.totalCarbideVolumePct + a.matrix.volumePct, 100, 1e-9);
        for (const p of a.phases) {
          expect(p.massPct).toBeGreaterThanOrEqual(0);
          expect(p.volumePct).toBeGreaterThanOrEqual(0);
          for (const v of Object.values(p.elements)) expect(v).toBeGreaterThanOrEqual(0);
        }
        for (const v of Object.values(a.matrix.composition)) expect(v).toBeGreaterThanOrEqual(0);
        // annealed limit: all carbon is in carbides
        within(a.matrix.carbonMassPct, 0, 1e-9);
      }),
      { numRuns: 300 },
    );
  });
});
