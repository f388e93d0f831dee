import { describe, expect, it } from "vitest";
import { InputError } from "@shared/metallurgy/errors";
import {
  arrheniusDiffusivityM2PerS,
  AUSTENITE_DIFFUSION_DATA,
  austeniteDiffusivityM2PerS,
  coarseningRateRatio,
  coarseningRateRatioWithWarnings,
} from "@shared/metallurgy/carbides";

const within = (actual: number, expected: number, tol: number) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tol);

describe("coarseningRateRatio", () => {
  it("k(1100 °C)/k(1000 °C) = 6.514 (V) / 5.433 (Cr) (science-reference §2.5 check 3)", () => {
    within(coarseningRateRatio(272.4e3, 1100, 1000), 6.514, 0.005); // [Computed] §2.5 check 3; Q of V [Checked]
    within(coarseningRateRatio(246e3, 1100, 1000), 5.433, 0.005); // [Computed] §2.5 check 3; Q of Cr [Checked]
  });

  it("is 1 at the reference temperature and below 1 when colder", () => {
    expect(coarseningRateRatio(250e3, 900, 900)).toBe(1);
    expect(coarseningRateRatio(250e3, 800, 900)).toBeLessThan(1);
    expect(coarseningRateRatio(0, 800, 900)).toBe(1);
  });

  it("warns below 500 °C and above 1300 °C (§2.5 valid inputs)", () => {
    expect(coarseningRateRatioWithWarnings(250e3, 400, 1000).warnings.join(" ")).toMatch(/500/);
    expect(coarseningRateRatioWithWarnings(250e3, 1350, 1000).warnings.join(" ")).toMatch(/1300/);
    expect(coarseningRateRatioWithWarnings(250e3, 1100, 1000).warnings).toEqual([]);
  });

  it("rejects temperatures at or below absolute zero and negative Q", () => {
    expect(() => coarseningRateRatio(250e3, -273.15, 1000)).toThrow(InputError);
    expect(() => coarseningRateRatio(-1, 900, 1000)).toThrow(InputError);
    expect(() => coarseningRateRatio(250e3, 900, Number.NaN)).toThrow(InputError);
  });
});

describe("diffusivity of carbide formers in austenite", () => {
  it("D of V and Cr at 1100 °C: 2.70e-15 / 1.19e-14 m²/s (science-reference §2.5 check 4)", () => {
    within(austeniteDiffusivityM2PerS("V", 1100), 2.7e-15, 0.027e-15); // [Computed] §2.5 check 4, ±1 %; data [Checked]
    within(austeniteDiffusivityM2PerS("Cr", 1100), 1.19e-14, 0.0119e-14); // [Computed] §2.5 check 4, ±1 %
    within(arrheniusDiffusivityM2PerS(0.27, 246e3, 1100), 1.19e-14, 0.0119e-14); // [Computed] §2.5 check 4
  });

  it("holds the checked parameters of §2.5", () => {
    expect(AUSTENITE_DIFFUSION_DATA.V).toMatchObject({ d0Cm2PerS: 0.62, activationJPerMol: 272.4e3 }); // [Checked] radiotracer 1987
    expect(AUSTENITE_DIFFUSION_DATA.Cr).toMatchObject({ d0Cm2PerS: 0.27, activationJPerMol: 246e3 }); // [Checked]
    expect(AUSTENITE_DIFFUSION_DATA.Mo).toMatchObject({ d0Cm2PerS: 3.6e-2, activationJPerMol: 239.8e3 }); // [Checked]
    within(65.1 * 4184, 272.4e3, 0.1e3); // 65.1 kcal/mol = 272.4 kJ/mol
  });

  it("orders the solutes: V slowest at hardening temperatures", () => {
    expect(austeniteDiffusivityM2PerS("V", 1050)).toBeLessThan(austeniteDiffusivityM2PerS("Cr", 1050));
  });

  it("rejects unknown elements and bad temperatures", () => {
    expect(() => austeniteDiffusivityM2PerS("W" as never, 1000)).toThrow(InputError);
    expect(() => austeniteDiffusivityM2PerS("V", -300)).toThrow(InputError);
    expect(() => arrheniusDiffusivityM2PerS(-1, 1, 1000)).toThrow(InputError);
  });
});
