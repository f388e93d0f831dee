import { describe, expect, it } from "vitest";
import {
  hasSolidDiffusionData,
  soluteDiffusivityInSolidM2PerS,
} from "../../../../shared/metallurgy/solidification/solid-diffusion";
import { clyneKurzOmega, fourierNumber } from "../../../../shared/metallurgy/solidification/back-diffusion";
import { InputError } from "../../../../shared/metallurgy/errors";

const relErr = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe("solute diffusivity in solid steel", () => {
  it("reproduces the §2.5 check values for V and Cr in austenite at 1100 °C", () => {
    // [Computed] science-reference §2.5 check 4: V (D0 0.62 cm²/s, Q 272.4 kJ/mol) 2.70e-15 m²/s; Cr (0.27, 246) 1.19e-14, ±1 %
    expect(relErr(soluteDiffusivityInSolidM2PerS("V", 1100), 2.7e-15)).toBeLessThan(0.01);
    expect(relErr(soluteDiffusivityInSolidM2PerS("Cr", 1100), 1.19e-14)).toBeLessThan(0.01);
  });

  it("gives the α of the §3.4 back-diffusion example (1400 °C, t_f 100 s, λ2 150 µm)", () => {
    // [Computed] science-reference §3.4: α_C = 8.52 (Won & Thomas 2001 D_C in γ [Checked]), α_Cr = 0.0100, α_V = 0.0035
    const alphaC = fourierNumber(soluteDiffusivityInSolidM2PerS("C", 1400), 100, 150);
    expect(alphaC).toBeCloseTo(8.52, 1);
    // [Computed] same example: Ω(α_C) = 0.472 (nearly lever)
    expect(clyneKurzOmega(alphaC)).toBeCloseTo(0.472, 3);
    expect(relErr(fourierNumber(soluteDiffusivityInSolidM2PerS("Cr", 1400), 100, 150), 0.01)).toBeLessThan(0.02);
    expect(relErr(fourierNumber(soluteDiffusivityInSolidM2PerS("V", 1400), 100, 150), 0.0035)).toBeLessThan(0.03);
  });

  it("carbon diffuses faster in ferrite than in austenite", () => {
    // Won & Thomas (2001): D_C(δ) = 0.0127·exp(−19450/RT) vs D_C(γ) = 0.0761·exp(−32160/RT) cm²/s
    expect(soluteDiffusivityInSolidM2PerS("C", 1450, "delta")).toBeGreaterThan(soluteDiffusivityInSolidM2PerS("C", 1450, "gamma"));
  });

  it("rejects elements without data and absurd temperatures", () => {
    expect(hasSolidDiffusionData("Mn")).toBe(false);
    expect(hasSolidDiffusionData("V")).toBe(true);
    expect(() => soluteDiffusivityInSolidM2PerS("Mn", 1400)).toThrow(InputError);
    expect(() => soluteDiffusivityInSolidM2PerS("V", 1400, "delta")).toThrow(/diffusion data/);
    expect(() => soluteDiffusivityInSolidM2PerS("C", 2500)).toThrow(/tempC/);
  });
});
