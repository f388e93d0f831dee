import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { InputError } from "@shared/metallurgy/errors";
import { allocateCarbides, hardenedState } from "@shared/metallurgy/carbides";

const within = (actual: number, expected: number, tol: number) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tol);

describe("hardenedState (CARB-1 step 5)", () => {
  it("440C-type with half the M7C3 dissolved: C_sol 0.573, Cr_sol 15.22 (science-reference §2.2 check 8)", () => {
    const h = hardenedState({ C: 1.075, Cr: 17, Mo: 0.5 }, { dissolvedFraction: { M7C3: 0.5 } });
    within(h.solution.carbonMassPct, 0.573, 0.005); // [Computed] §2.2 check 8; model CARB-1
    within(h.solution.chromiumMassPct, 15.22, 0.005); // [Computed] §2.2 check 8
  });

  it("52100-type with 60 % of the M3C dissolved: C_sol 0.638, Cr_sol 1.19 (check 8)", () => {
    const h = hardenedState({ C: 1.0, Cr: 1.45 }, { dissolvedFraction: { M3C: 0.6 } });
    within(h.solution.carbonMassPct, 0.638, 0.005); // [Computed] §2.2 check 8; model CARB-1
    within(h.solution.chromiumMassPct, 1.19, 0.005); // [Computed] §2.2 check 8
  });

  it("keeps the undissolved carbides with their volume", () => {
    const h = hardenedState({ C: 1.55, Cr: 11.5, Mo: 0.8, V: 0.9 }, { dissolvedFraction: { M7C3: 0.4 } });
    const annealed = allocateCarbides({ C: 1.55, Cr: 11.5, Mo: 0.8, V: 0.9 });
    const mc = h.phases.find((p) => p.type === "MC")!;
    within(mc.massPct, annealed.phases.find((p) => p.type === "MC")!.massPct, 1e-12); // MC default: not dissolved
    within(h.phases.find((p) => p.type === "M7C3")!.massPct, 0.6 * annealed.phases.find((p) => p.type === "M7C3")!.massPct, 1e-12);
    within(h.totalCarbideVolumePct + h.solution.volumePct, 100, 1e-9);
    expect(h.totalCarbideVolumePct).toBeLessThan(annealed.totalCarbideVolumePct);
  });

  it("returns the bulk composition when everything dissolves, and the annealed matrix when nothing does", () => {
    const comp = { C: 0.85, Cr: 4.1, Mo: 5.0, W: 6.4, V: 1.9 };
    const all = hardenedState(comp, { dissolvedFraction: { MC: 1, M6C: 1, M23C6: 1 } });
    for (const el of ["C", "Cr", "Mo", "W", "V"] as const) within(all.solution.composition[el], comp[el], 1e-9);
    expect(all.phases).toEqual([]);
    const none = hardenedState(comp, { dissolvedFraction: {} });
    within(none.solution.carbonMassPct, 0, 1e-12);
    within(none.solution.chromiumMassPct, none.annealed.matrix.chromiumMassPct, 1e-12);
  });

  it("conserves C and Cr between solution and remaining carbides", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.2, max: 2.5, noNaN: true }),
        fc.double({ min: 0, max: 20, noNaN: true }),
        fc.double({ min: 0, max: 3, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (C, Cr, V, fCr, fMC) => {
          const comp = { C, Cr, V };
          const h = hardenedState(comp, { dissolvedFraction: { MC: fMC, M7C3: fCr, M23C6: fCr, M3C: fCr } });
          for (const el of ["C", "Cr", "V"] as const) {
            const inCarbides = h.phases.reduce((s, p) => s + p.elements[el], 0);
            within(inCarbides + (h.solution.composition[el] * h.solution.massPct) / 100, comp[el], 1e-9);
          }
          expect(h.solution.carbonMassPct).toBeGreaterThanOrEqual(0);
          expect(h.solution.chromiumMassPct).toBeGreaterThanOrEqual(0);
        },
      ),
    );
  });

  it("rejects bad dissolved fractions with InputError", () => {
    expect(() => hardenedState({ C: 1 }, { dissolvedFraction: { M3C: 1.2 } })).toThrow(InputError);
    expect(() => hardenedState({ C: 1 }, { dissolvedFraction: { M3C: -0.1 } })).toThrow(InputError);
    expect(() => hardenedState({ C: 1 }, { dissolvedFraction: { M3C: Number.NaN } })).toThrow(InputError);
    expect(() => hardenedState({ C: 1 }, { dissolvedFraction: { M2C: 0.5 } as never })).toThrow(InputError);
    expect(() => hardenedState({ C: 1 }, {} as never)).toThrow(InputError);
    expect(() => hardenedState({ C: 4 }, { dissolvedFraction: {} })).toThrow(InputError);
  });
});
