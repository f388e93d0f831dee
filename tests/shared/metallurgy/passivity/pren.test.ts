import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { InputError } from "@shared/metallurgy/errors";
import { chromiumTiedInCarbide, pren, prenWithWarnings } from "@shared/metallurgy/passivity";

const within = (actual: number, expected: number, tol: number) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tol);

describe("pren", () => {
  it("ranks 304-type grades (science-reference §1d check 1)", () => {
    within(pren({ Cr: 19.0, N: 0.05 }), 19.8, 0.005); // [Computed] §1d check 1, 304 mid; ASTM A240 limits [Mem]
    within(pren({ Cr: 18.0 }), 18.0, 0.005); // [Computed] §1d check 1, 304 min
  });

  it("ranks 316-type grades, with N×16 and N×30 (check 2)", () => {
    within(pren({ Cr: 17.0, Mo: 2.5, N: 0.05 }), 26.05, 0.005); // [Computed] §1d check 2, 316 mid
    within(pren({ Cr: 16.0, Mo: 2.0 }), 22.6, 0.005); // [Computed] §1d check 2, 316 min
    within(pren({ Cr: 17.0, Mo: 2.5, N: 0.05 }, { nitrogenFactor: 30 }), 26.75, 0.005); // [Computed] §1d check 2, N×30 variant [Checked]
  });

  it("ranks martensitic blade grades (check 3)", () => {
    within(pren({ Cr: 13.0 }), 13.0, 0.005); // [Computed] §1d check 3, 420; ASTM A276 [Checked]
    within(pren({ Cr: 17.0, Mo: 0.75 }), 19.475, 0.005); // [Computed] §1d check 3, 440C max Mo
    within(pren({ Cr: 17.0, Mo: 0.375 }), 18.2375, 0.005); // [Computed] §1d check 3, 440C mid Mo
  });

  it("uses the W-inclusive ISO 15156-3 form for duplex grades (check 4)", () => {
    within(pren({ Cr: 25, Mo: 4.0, N: 0.28 }), 42.68, 0.005); // [Computed] §1d check 4, UNS S32750 nominal
    within(pren({ Cr: 25, Mo: 3.5, W: 0.7, N: 0.25 }), 41.705, 0.005); // [Computed] §1d check 4, ISO 15156-3 W term [Checked]
  });

  it("warns for non-stainless families, not for stainless ones", () => {
    expect(prenWithWarnings({ Cr: 5, Mo: 1 }).warnings.join(" ")).toMatch(/10\.5/);
    expect(prenWithWarnings({ Cr: 13 }).warnings).toEqual([]);
    expect(prenWithWarnings({ Cr: 5 }).value).toBe(5);
  });

  it("gives a matrix PREN from free Cr (teaching extension [App])", () => {
    const free = chromiumTiedInCarbide({ C: 1.075, Cr: 17 }, "M7C3").freeCrMassPct;
    within(pren({ C: 1.075, Cr: 17, Mo: 0.75 }, { chromiumMassPct: free }), free + 3.3 * 0.75, 1e-12);
  });

  it("is never negative and grows with every term", () => {
    const comp = fc.record({
      Cr: fc.double({ min: 0, max: 30, noNaN: true }),
      Mo: fc.double({ min: 0, max: 10, noNaN: true }),
      W: fc.double({ min: 0, max: 10, noNaN: true }),
      N: fc.double({ min: 0, max: 1, noNaN: true }),
    });
    fc.assert(
      fc.property(comp, fc.constantFrom<16 | 30>(16, 30), (c, nf) => {
        const value = pren(c, { nitrogenFactor: nf });
        expect(value).toBeGreaterThanOrEqual(0);
        expect(pren({ ...c, Mo: c.Mo + 1 }, { nitrogenFactor: nf })).toBeGreaterThan(value);
      }),
    );
  });

  it("rejects bad input with InputError", () => {
    expect(() => pren({ Cr: -1 })).toThrow(InputError);
    expect(() => pren({ Cr: 60, Mo: 50 })).toThrow(InputError); // sum > 100
    expect(() => pren({ Cr: 18 }, { nitrogenFactor: 27 as never })).toThrow(InputError);
    expect(() => pren({ Cr: 18 }, { chromiumMassPct: Number.NaN })).toThrow(InputError);
  });
});
