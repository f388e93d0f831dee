import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { InputError } from "@shared/metallurgy/errors";
import {
  allocateCarbides,
  chromiumAcmWarning,
  DEFAULT_DISSOLUTION_WINDOWS,
  dissolvedFractionsForAustenitizing,
  hardenedState,
  HIGH_SPEED_STEEL_WARNING,
} from "@shared/metallurgy/carbides";
import { martensitePlateauHardnessHrc } from "@shared/metallurgy/hardening";

const within = (actual: number, expected: number, tol: number) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tol);
const solutionCarbon = (comp: Record<string, number> & { C: number }, tempC: number) =>
  hardenedState(comp, { dissolvedFraction: dissolvedFractionsForAustenitizing(comp, tempC).dissolvedFraction }).solution.carbonMassPct;

describe("dissolvedFractionsForAustenitizing", () => {
  it("puts austenite on the Acm line for hypereutectoid plain-carbon steel (§5.2 check 4: C_γ 0.875 at 760 °C, 1.002 at 800 °C)", () => {
    within(solutionCarbon({ C: 0.95 }, 760), 0.875, 0.001); // [Computed] science-reference §5.2 check 4, lever rule on Acm
    within(solutionCarbon({ C: 1.2 }, 800), 1.002, 0.001); // [Computed] science-reference §5.2 check 4
    const r = dissolvedFractionsForAustenitizing({ C: 0.95 }, 760);
    expect(r.method.M3C).toBe("acm-lever-rule");
    within(r.acmCarbonMassPct!, 0.875, 0.001); // [Computed] §5.2 check 4
  });

  it("dissolves all cementite above Acm and none below the eutectoid", () => {
    expect(dissolvedFractionsForAustenitizing({ C: 0.95 }, 800).dissolvedFraction.M3C).toBe(1); // Acm(0.95) ≈ 783.6 °C
    within(solutionCarbon({ C: 0.95 }, 800), 0.95, 1e-9);
    expect(dissolvedFractionsForAustenitizing({ C: 0.6 }, 750).dissolvedFraction.M3C).toBe(1); // hypoeutectoid above A1
    const cold = dissolvedFractionsForAustenitizing({ C: 0.95 }, 700);
    expect(cold.dissolvedFraction.M3C).toBe(0);
    expect(cold.warnings.join(" ")).toMatch(/eutectoid/);
  });

  it("uses the [App] windows for alloy carbides; 440C-type at 1050 °C reproduces §2.2 check 8", () => {
    const r = dissolvedFractionsForAustenitizing({ C: 1.075, Cr: 17, Mo: 0.5 }, 1050);
    expect(r.dissolvedFraction.M7C3).toBe(0.5); // [App] window 900–1200 °C
    expect(r.method.M7C3).toBe("app-heuristic");
    within(solutionCarbon({ C: 1.075, Cr: 17 }, 1050), 0.573, 0.005); // consistent with [Computed] §2.2 check 8
    const m2 = dissolvedFractionsForAustenitizing({ C: 0.85, Cr: 4.1, Mo: 5.0, W: 6.4, V: 1.9 }, 1200);
    within(m2.dissolvedFraction.MC, 0.15, 1e-12);
    within(m2.dissolvedFraction.M6C, 0.4, 1e-12);
    expect(m2.dissolvedFraction.M23C6).toBe(1);
    expect(DEFAULT_DISSOLUTION_WINDOWS.M23C6.endC).toBe(1100);
  });

  it("accepts user-tuned windows", () => {
    const r = dissolvedFractionsForAustenitizing({ C: 1.55, Cr: 11.5, V: 0.9 }, 1000, { windows: { M7C3: { startC: 950, endC: 1050, maxFraction: 0.8 } } });
    within(r.dissolvedFraction.M7C3, 0.4, 1e-12);
  });

  it("warns that Acm is binary Fe–C for alloyed cementite steels", () => {
    expect(dissolvedFractionsForAustenitizing({ C: 1.0, Cr: 1.45 }, 800).warnings.join(" ")).toMatch(/binary Fe–C/);
  });

  it("does not model chromium's effect on cementite dissolution, and says so", () => {
    // No Cr correction to Acm exists in science-reference §5.2 (binary straight line only), so 52100-type
    // (C 1.0, Cr 1.45) and plain Fe–1.0C get the same carbon in solution: both are fully dissolved above
    // Acm(1.0) = 799.3 °C ([Computed] §5.2 check 4), and at 780 °C both sit on the same Acm line.
    for (const tempC of [780, 845]) within(solutionCarbon({ C: 1.0, Cr: 1.45 }, tempC), solutionCarbon({ C: 1.0 }, tempC), 0.002);
    within(solutionCarbon({ C: 1.0, Cr: 1.45 }, 845), 1.0, 1e-9);
    const r = dissolvedFractionsForAustenitizing({ C: 1.0, Cr: 1.45, Mn: 0.35, Si: 0.25 }, 845);
    const text = r.warnings.join(" ");
    expect(text).toMatch(/Chromium's effect on cementite dissolution is not modelled/);
    expect(text).toMatch(/binary Fe–C/);
    // It quotes the cementite Cr share of CARB-1, y3 = 0.063 ([Computed] §2.2 check 2), and Andrews' Ac1 term (§5.2 [Mem]).
    expect(text).toMatch(/0\.063 of its metal sites/);
    expect(text).toMatch(/Ac1 \+16\.9 °C per % Cr/);
    expect(r.warnings).toContain(chromiumAcmWarning(1.45, 0.063));
    // A plain-carbon steel gets no chromium warning.
    expect(dissolvedFractionsForAustenitizing({ C: 0.95, Mn: 0.4 }, 800).warnings.join(" ")).not.toMatch(/Chromium/);
  });

  it("warns that the high-speed-steel carbon in solution (and hardness) reads low", () => {
    // Trace of M2-type (C 0.85, Cr 4.1, Mo 5.0, W 6.4, V 1.9) from 1200 °C. Allocation [Computed] §2.2 check 6:
    // C in MC 0.392, in M6C 0.348, in M23C6 0.110 %. [App] windows dissolve 15 % MC, 40 % M6C, all M23C6,
    // releasing 0.308 % C into ≈ 88 % austenite → 0.350 % C in solution; the A255 polynomial (§2.3, [Checked])
    // gives 53.4 HRC for it. Hardened and tempered M2 is typically 63–66 HRC with ≈ 0.5 % C in solution (from memory).
    const comp = { C: 0.85, Cr: 4.1, Mo: 5.0, W: 6.4, V: 1.9 };
    const annealed = allocateCarbides(comp);
    const carbonIn = (type: string) => annealed.phases.find((p) => p.type === type)!.elements.C;
    within(carbonIn("MC"), 0.392, 0.001);
    within(carbonIn("M6C"), 0.348, 0.001);
    within(carbonIn("M23C6"), 0.110, 0.001);
    within(solutionCarbon(comp, 1200), 0.35, 0.002);
    within(martensitePlateauHardnessHrc(solutionCarbon(comp, 1200)).value, 53.4, 0.1);
    const r = dissolvedFractionsForAustenitizing(comp, 1200);
    expect(r.warnings).toContain(HIGH_SPEED_STEEL_WARNING);
    expect(HIGH_SPEED_STEEL_WARNING).toMatch(/0\.35 % C and 53 HRC/);
    // Steels without M6C do not get it.
    expect(dissolvedFractionsForAustenitizing({ C: 1.075, Cr: 17, Mo: 0.5 }, 1050).warnings).not.toContain(HIGH_SPEED_STEEL_WARNING);
  });

  it("never decreases with temperature and stays within 0–1", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 2, noNaN: true }),
        fc.double({ min: 0, max: 18, noNaN: true }),
        fc.double({ min: 700, max: 1300, noNaN: true }),
        fc.double({ min: 0, max: 99, noNaN: true }),
        (C, Cr, t, dt) => {
          const lo = dissolvedFractionsForAustenitizing({ C, Cr }, t).dissolvedFraction;
          const hi = dissolvedFractionsForAustenitizing({ C, Cr }, t + dt).dissolvedFraction;
          for (const k of Object.keys(lo) as (keyof typeof lo)[]) {
            expect(lo[k]).toBeGreaterThanOrEqual(0);
            expect(lo[k]).toBeLessThanOrEqual(1);
            expect(hi[k]).toBeGreaterThanOrEqual(lo[k] - 1e-12);
          }
        },
      ),
    );
  });

  it("rejects bad temperatures and windows with InputError", () => {
    expect(() => dissolvedFractionsForAustenitizing({ C: 1 }, -1)).toThrow(InputError);
    expect(() => dissolvedFractionsForAustenitizing({ C: 1 }, 1500)).toThrow(InputError);
    expect(() => dissolvedFractionsForAustenitizing({ C: 1 }, Number.NaN)).toThrow(InputError);
    expect(() => dissolvedFractionsForAustenitizing({ C: 1 }, 900, { windows: { MC: { startC: 1000, endC: 900, maxFraction: 1 } } })).toThrow(InputError);
    expect(() => dissolvedFractionsForAustenitizing({ C: 1 }, 900, { windows: { MC: { startC: 900, endC: 1000, maxFraction: 2 } } })).toThrow(InputError);
  });
});
