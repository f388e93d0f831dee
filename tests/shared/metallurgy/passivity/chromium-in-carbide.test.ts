import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { InfeasibleError, InputError } from "@shared/metallurgy/errors";
import { chromiumTiedInCarbide, CHROMIUM_CARBIDE_STOICHIOMETRY } from "@shared/metallurgy/passivity";

const within = (actual: number, expected: number, tol: number) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tol);

describe("chromiumTiedInCarbide", () => {
  it("304-type, all C as Cr23C6 (science-reference §1c check 1)", () => {
    const r = chromiumTiedInCarbide({ C: 0.08, Cr: 18.0 }, "M23C6");
    within(r.tiedCrMassPct, 1.328, 0.01); // [Computed] §1c check 1
    within(r.freeCrMassPct, 16.91, 0.01); // [Computed] §1c check 1
  });

  it("420-type, Cr23C6 and Cr7C3 (check 2)", () => {
    const m23 = chromiumTiedInCarbide({ C: 0.2, Cr: 13.0 }, "M23C6");
    const m7 = chromiumTiedInCarbide({ C: 0.2, Cr: 13.0 }, "M7C3");
    within(m23.freeCrMassPct, 10.03, 0.01); // [Computed] §1c check 2
    within(m23.tiedCrMassPct, 3.319, 0.01); // [Computed] §1c check 2
    within(m7.freeCrMassPct, 11.23, 0.01); // [Computed] §1c check 2
    within(m7.tiedCrMassPct, 2.02, 0.01); // [Computed] §1c check 2
  });

  it("440C-type: Cr23C6 is infeasible, Cr7C3 leaves 6.97 % (check 3)", () => {
    // [Computed] §1c check 3: Cr23C6 would need 17.84 % Cr
    let error: unknown;
    try {
      chromiumTiedInCarbide({ C: 1.075, Cr: 17.0 }, "M23C6");
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(InfeasibleError);
    expect((error as InfeasibleError).reason).toBe("insufficient-chromium");
    expect((error as Error).message).toMatch(/not enough chromium/i);
    expect((error as Error).message).toContain("17.84");
    const m7 = chromiumTiedInCarbide({ C: 1.075, Cr: 17.0 }, "M7C3");
    within(m7.freeCrMassPct, 6.97, 0.01); // [Computed] §1c check 3
    within(m7.carbideMassPct, 11.934, 0.01); // [Computed] §1c check 3
  });

  it("440C-type with only 0.475 % C in Cr7C3, the rest dissolved (check 4)", () => {
    const r = chromiumTiedInCarbide({ C: 1.075, Cr: 17.0 }, "M7C3", { carbonInCarbideMassPct: 0.475 });
    within(r.freeCrMassPct, 12.88, 0.01); // [Computed] §1c check 4
    within(r.matrixCarbonMassPct, (100 * 0.6) / (100 - r.carbideMassPct), 1e-12);
  });

  it("has the stoichiometric Cr:C mass ratios r23 = 16.595 and r7 = 10.101", () => {
    const ratio = (type: "M23C6" | "M7C3") => chromiumTiedInCarbide({ C: 1, Cr: 30 }, type).tiedCrMassPct;
    within(ratio("M23C6"), 16.595, 16.595e-3); // [Computed] §1c formulas, rel. 1e-3
    within(ratio("M7C3"), 10.101, 10.101e-3); // [Computed] §1c formulas, rel. 1e-3
    expect(CHROMIUM_CARBIDE_STOICHIOMETRY.M23C6).toEqual({ metalAtoms: 23, carbonAtoms: 6 });
  });

  it("a mixed carbide binds Cr in proportion to its Cr share and adds Fe to the carbide mass", () => {
    const pure = chromiumTiedInCarbide({ C: 0.2, Cr: 13 }, "M23C6");
    const mixed = chromiumTiedInCarbide({ C: 0.2, Cr: 13 }, "M23C6", { chromiumShare: 0.7 });
    within(mixed.tiedCrMassPct, 0.7 * pure.tiedCrMassPct, 1e-12);
    expect(mixed.tiedFeMassPct).toBeGreaterThan(0);
    within(mixed.carbideMassPct, 0.2 + mixed.tiedCrMassPct + mixed.tiedFeMassPct, 1e-12);
  });

  it("never returns negative free Cr; either a result or InfeasibleError", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 3.5, noNaN: true }),
        fc.double({ min: 0, max: 30, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0.01, max: 1, noNaN: true }),
        fc.constantFrom<"M23C6" | "M7C3">("M23C6", "M7C3"),
        (c, cr, share, y, type) => {
          try {
            const r = chromiumTiedInCarbide({ C: c, Cr: cr }, type, { carbonInCarbideMassPct: c * share, chromiumShare: y });
            expect(r.freeCrMassPct).toBeGreaterThanOrEqual(0);
            expect(r.tiedCrMassPct).toBeLessThanOrEqual(cr);
            expect(r.carbideMassPct).toBeGreaterThanOrEqual(0);
            // Cr mass balance: tied + free·matrix = total
            within(r.tiedCrMassPct + (r.freeCrMassPct * (100 - r.carbideMassPct)) / 100, cr, 1e-9);
          } catch (e) {
            expect(e).toBeInstanceOf(InfeasibleError);
          }
        },
      ),
    );
  });

  it("rejects bad input with InputError", () => {
    expect(() => chromiumTiedInCarbide({ C: 0.2, Cr: 13 }, "M3C" as never)).toThrow(InputError);
    expect(() => chromiumTiedInCarbide({ C: 0.2, Cr: 13 }, "M7C3", { carbonInCarbideMassPct: 0.3 })).toThrow(InputError);
    expect(() => chromiumTiedInCarbide({ C: 0.2, Cr: 13 }, "M7C3", { carbonInCarbideMassPct: -0.1 })).toThrow(InputError);
    expect(() => chromiumTiedInCarbide({ C: 0.2, Cr: 13 }, "M7C3", { chromiumShare: 0 })).toThrow(InputError);
    expect(() => chromiumTiedInCarbide({ C: 0.2, Cr: 13 }, "M7C3", { chromiumShare: 1.1 })).toThrow(InputError);
    expect(() => chromiumTiedInCarbide({ C: -0.2, Cr: 13 }, "M7C3")).toThrow(InputError);
  });
});
