import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { InputError } from "@shared/metallurgy/errors";
import { FILM_GROWTH_DEFAULTS, passiveFilmThicknessNm, passiveFilmThicknessWithWarnings } from "@shared/metallurgy/passivity";

const within = (actual: number, expected: number, tol: number) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tol);

describe("passiveFilmThicknessNm", () => {
  it("inverse-logarithmic law with the illustrative defaults (science-reference §1b check 1)", () => {
    // [Computed] §1b check 1, ±1e-4 nm; parameters [App]
    within(passiveFilmThicknessNm(1, "inverse-log"), 1.0, 1e-4);
    within(passiveFilmThicknessNm(100, "inverse-log"), 1.2991, 1e-4);
    within(passiveFilmThicknessNm(3600, "inverse-log"), 1.6933, 1e-4);
    within(passiveFilmThicknessNm(22026.47, "inverse-log"), 2.0, 1e-4);
  });

  it("direct-logarithmic law with the illustrative defaults (check 2)", () => {
    // [Computed] §1b check 2, ±1e-4 nm; parameters [App]
    within(passiveFilmThicknessNm(0, "direct-log"), 1.0, 1e-4);
    within(passiveFilmThicknessNm(1, "direct-log"), 1.0753, 1e-4);
    within(passiveFilmThicknessNm(3600, "direct-log"), 1.8891, 1e-4);
    within(passiveFilmThicknessNm(86400, "direct-log"), 2.2341, 1e-4);
    within(passiveFilmThicknessNm(3.156e7, "direct-log"), 2.8748, 1e-4);
  });

  it("keeps the defaults of the reference", () => {
    expect(FILM_GROWTH_DEFAULTS.direct).toEqual({ initialNm: 1.0, nmPerDecade: 0.25, tauS: 1 }); // [App] §1b
    expect(FILM_GROWTH_DEFAULTS.inverse).toEqual({ aPerNm: 1.0, bPerNm: 0.05 }); // [App] §1b
  });

  it("accepts custom parameters", () => {
    within(passiveFilmThicknessNm(9, "direct-log", { initialNm: 2, nmPerDecade: 1, tauS: 1 }), 3, 1e-12);
    within(passiveFilmThicknessNm(Math.E, "inverse-log", { aPerNm: 2, bPerNm: 1 }), 1, 1e-12);
  });

  it("grows monotonically and stays positive", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 4e8, noNaN: true }), fc.double({ min: 1e-3, max: 4e8, noNaN: true }), (t1, t2) => {
        const [a, b] = t1 < t2 ? [t1, t2] : [t2, t1];
        for (const law of ["direct-log", "inverse-log"] as const) {
          const la = passiveFilmThicknessNm(a, law);
          expect(la).toBeGreaterThan(0);
          expect(passiveFilmThicknessNm(b, law)).toBeGreaterThanOrEqual(la);
        }
      }),
    );
  });

  it("warns outside the observed 1–3 nm range [Checked] Olsson & Landolt 2003", () => {
    expect(passiveFilmThicknessWithWarnings(3600, "direct-log").warnings).toEqual([]);
    expect(passiveFilmThicknessWithWarnings(4.8e8, "inverse-log").warnings.join(" ")).toMatch(/1–3 nm/);
  });

  it("rejects invalid times and parameters (§1b valid inputs)", () => {
    expect(() => passiveFilmThicknessNm(-1, "direct-log")).toThrow(InputError);
    expect(() => passiveFilmThicknessNm(0, "inverse-log")).toThrow(InputError);
    expect(() => passiveFilmThicknessNm(Math.exp(20), "inverse-log")).toThrow(InputError); // singular at e^(A/B) ≈ 4.85e8 s
    expect(() => passiveFilmThicknessNm(5e8, "inverse-log")).toThrow(InputError);
    expect(() => passiveFilmThicknessNm(1, "inverse-log", { aPerNm: 0 })).toThrow(InputError);
    expect(() => passiveFilmThicknessNm(1, "inverse-log", { bPerNm: -0.1 })).toThrow(InputError);
    expect(() => passiveFilmThicknessNm(1, "direct-log", { nmPerDecade: -0.1 })).toThrow(InputError);
    expect(() => passiveFilmThicknessNm(1, "direct-log", { tauS: 0 })).toThrow(InputError);
    expect(() => passiveFilmThicknessNm(Number.NaN, "direct-log")).toThrow(InputError);
    expect(() => passiveFilmThicknessNm(1, "parabolic" as never)).toThrow(InputError);
  });
});
