import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { InputError } from "@shared/metallurgy/errors";
import { hardenedState } from "@shared/metallurgy/carbides";
import { andrewsMsC, andrewsMsWithWarnings, retainedAusteniteFraction } from "@shared/metallurgy/hardening";

const within = (actual: number, expected: number, tol: number) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tol);

describe("andrewsMsC (Andrews 1965, linear)", () => {
  it("C 0.4, Mn 0.8, Cr 0.85 → 335.2 °C (science-reference §2.4 check 1)", () => {
    within(andrewsMsC({ C: 0.4, Mn: 0.8, Cr: 0.85 }), 335.2, 0.05); // [Computed] §2.4 check 1; formula [Checked]
  });

  it("C 0.8, Mn 0.75 → 177.8 °C (check 2)", () => {
    within(andrewsMsC({ C: 0.8, Mn: 0.75 }), 177.8, 0.05); // [Computed] §2.4 check 2
  });

  it("C 0.6, Mn 0.7, Cr 0.5 → 257.9 °C; C 0.95, Mn 0.4 → 125.0 °C with a warning (check 3)", () => {
    within(andrewsMsC({ C: 0.6, Mn: 0.7, Cr: 0.5 }), 257.9, 0.05); // [Computed] §2.4 check 3
    const high = andrewsMsWithWarnings({ C: 0.95, Mn: 0.4 });
    within(high.value, 125.0, 0.05); // [Computed] §2.4 check 3
    expect(high.warnings.join(" ")).toMatch(/underestimates Ms/); // [Mem] handbook ≈ 220 °C at 0.8 C
    expect(andrewsMsWithWarnings({ C: 0.4, Mn: 0.8, Cr: 0.85 }).warnings).toEqual([]);
  });

  it("warns outside Andrews' data set (Cr > 4.6 etc. [Mem])", () => {
    expect(andrewsMsWithWarnings({ C: 0.5, Cr: 13 }).warnings.join(" ")).toMatch(/Cr = 13/);
    expect(andrewsMsWithWarnings({ C: 0.5, Ni: 6 }).warnings.join(" ")).toMatch(/Ni = 6/);
  });

  it("takes the hardened solution, not the bulk (440C-type, f_d(M7C3) = 0.5)", () => {
    const h = hardenedState({ C: 1.075, Cr: 17, Mo: 0.5 }, { dissolvedFraction: { M7C3: 0.5 } });
    const ms = andrewsMsC(h.solution.composition);
    within(ms, 539 - 423 * h.solution.carbonMassPct - 12.1 * h.solution.chromiumMassPct - 7.5 * h.solution.molybdenumMassPct, 1e-9);
    expect(ms).toBeGreaterThan(andrewsMsC({ C: 1.075, Cr: 17, Mo: 0.5 }));
  });

  it("falls as any listed element rises", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1, noNaN: true }), fc.constantFrom("C", "Mn", "Ni", "Cr", "Mo"), (c, el) => {
        const base = { C: c, Mn: 0.5 };
        const raised = { ...base, [el]: ((base as Record<string, number>)[el] ?? 0) + 0.1 };
        expect(andrewsMsC(raised)).toBeLessThan(andrewsMsC(base));
      }),
    );
  });

  it("rejects negative contents and compositions that push Ms below absolute zero", () => {
    expect(() => andrewsMsC({ C: -0.1 })).toThrow(InputError);
    expect(() => andrewsMsC({ C: 2.0, Cr: 30 })).toThrow(InputError);
  });
});

describe("retainedAusteniteFraction (Koistinen–Marburger 1959)", () => {
  it("matches science-reference §2.4 check 4", () => {
    // [Computed] §2.4 check 4, ±5e-4; f_RA = exp(−0.011·(Ms − T)) [Checked]
    within(retainedAusteniteFraction(177.8, 20), 0.1763, 5e-4);
    within(retainedAusteniteFraction(200, 25), 0.1459, 5e-4);
    within(retainedAusteniteFraction(300, 20), 0.046, 5e-4);
    within(retainedAusteniteFraction(177.8, -80), 0.0587, 5e-4);
    within(retainedAusteniteFraction(150, 150), 1.0, 5e-4);
  });

  it("is 1 at or above Ms and falls as the quench goes colder", () => {
    expect(retainedAusteniteFraction(150, 200)).toBe(1);
    fc.assert(
      fc.property(fc.double({ min: -200, max: 600, noNaN: true }), fc.double({ min: -270, max: 600, noNaN: true }), (ms, t) => {
        const f = retainedAusteniteFraction(ms, t);
        expect(f).toBeGreaterThan(0);
        expect(f).toBeLessThanOrEqual(1);
        if (t - 10 > -273.15) expect(retainedAusteniteFraction(ms, t - 10)).toBeLessThanOrEqual(f);
      }),
    );
  });

  it("rejects temperatures at or below absolute zero and bad rate constants", () => {
    expect(() => retainedAusteniteFraction(200, -273.15)).toThrow(InputError);
    expect(() => retainedAusteniteFraction(Number.NaN, 20)).toThrow(InputError);
    expect(() => retainedAusteniteFraction(200, 20, 0)).toThrow(InputError);
  });
});
