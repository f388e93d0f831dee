import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { InputError } from "@shared/metallurgy/errors";
import {
  martensiteHardnessHrc,
  martensiteHardnessHrcWithWarnings,
  martensitePlateauHardnessHrc,
  maynierHardnessHv,
  maynierHardnessHvWithWarnings,
} from "@shared/metallurgy/hardening";

const within = (actual: number, expected: number, tol: number) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tol);

describe("martensiteHardnessHrc (ASTM A255 initial-hardness polynomial)", () => {
  it("C = 0.2 / 0.4 / 0.6 / 0.7 → 44.40 / 56.30 / 64.57 / 65.78 HRC (science-reference §2.3 check 1)", () => {
    // [Computed] §2.3 check 1, ±0.02 HRC; polynomial [Checked] public reproduction of ASTM A255-10(2014)
    within(martensiteHardnessHrc(0.2), 44.4, 0.02);
    within(martensiteHardnessHrc(0.4), 56.3, 0.02);
    within(martensiteHardnessHrc(0.6), 64.57, 0.02);
    within(martensiteHardnessHrc(0.7), 65.78, 0.02);
  });

  it("C = 0.45 → 58.90 HRC (check 2)", () => {
    within(martensiteHardnessHrc(0.45), 58.9, 0.02); // [Computed] §2.3 check 2
  });

  it("rises with carbon over its calibration range", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 0.69, noNaN: true }), (c) => {
        expect(martensiteHardnessHrc(c + 0.01)).toBeGreaterThan(martensiteHardnessHrc(c));
      }),
    );
  });

  it("warns above 0.7 % C and below 0.1 % C, not inside (§2.3 valid inputs)", () => {
    expect(martensiteHardnessHrcWithWarnings(0.8).warnings.join(" ")).toMatch(/above 0\.7/);
    expect(martensiteHardnessHrcWithWarnings(0.05).warnings.join(" ")).toMatch(/below 0\.1/);
    expect(martensiteHardnessHrcWithWarnings(0.5).warnings).toEqual([]);
    expect(martensiteHardnessHrcWithWarnings(0.8).value).toBe(martensiteHardnessHrc(0.8));
  });

  it("rejects C < 0 and C > 1.0 (§2.3 valid inputs)", () => {
    expect(() => martensiteHardnessHrc(-0.01)).toThrow(InputError);
    expect(() => martensiteHardnessHrc(1.01)).toThrow(InputError);
    expect(() => martensiteHardnessHrc(Number.NaN)).toThrow(InputError);
    expect(() => martensiteHardnessHrc(1.01)).toThrow(/carbonMassPct = 1\.01/);
  });
});

describe("maynierHardnessHv (Maynier, Jungmann & Dollet 1978)", () => {
  it("C 0.4, Si 0.25, Mn 0.8, Cr 0.85 at 36000 °C/h → 631.4 HV (science-reference §2.3 check 3)", () => {
    within(maynierHardnessHv({ C: 0.4, Si: 0.25, Mn: 0.8, Cr: 0.85 }, 36000), 631.4, 0.1); // [Computed] §2.3 check 3
  });

  it("C 0.2 at 3600 °C/h → 391.5 HV (check 4)", () => {
    within(maynierHardnessHv({ C: 0.2 }, 3600), 391.5, 0.1); // [Computed] §2.3 check 4
  });

  it("gains 21 HV per decade of cooling rate", () => {
    within(maynierHardnessHv({ C: 0.3 }, 36000) - maynierHardnessHv({ C: 0.3 }, 3600), 21, 1e-9);
  });

  it("warns above 0.5 % C and rejects a non-positive cooling rate", () => {
    expect(maynierHardnessHvWithWarnings({ C: 0.6 }, 3600).warnings.join(" ")).toMatch(/0\.5/);
    expect(maynierHardnessHvWithWarnings({ C: 0.4 }, 3600).warnings).toEqual([]);
    expect(() => maynierHardnessHv({ C: 0.4 }, 0)).toThrow(InputError);
    expect(() => maynierHardnessHv({ C: 0.4 }, -5)).toThrow(InputError);
    expect(() => maynierHardnessHv({ C: -0.4 }, 3600)).toThrow(InputError);
  });
});

describe("martensitePlateauHardnessHrc", () => {
  it("follows the A255 polynomial up to 0.7 % C", () => {
    // [Computed] science-reference §2.3 check 1: A255 at 0.4 % C = 56.30 HRC
    within(martensitePlateauHardnessHrc(0.4).value, 56.3, 0.02);
    expect(martensitePlateauHardnessHrc(0.4).value).toBe(martensiteHardnessHrc(0.4));
  });

  it("holds the 0.7 % value above 0.7 % C, with a warning, where the polynomial turns down", () => {
    // [Computed] science-reference §2.3 check 1: A255 at 0.7 % C = 65.78 HRC; plateau per Krauss (1999) [Pub, mem]
    const high = martensitePlateauHardnessHrc(1.0);
    within(high.value, 65.78, 0.02);
    expect(martensiteHardnessHrc(1.0)).toBeLessThan(55); // the raw polynomial would report ~51 HRC
    expect(high.warnings.join(" ")).toMatch(/held at the 0.7 % value/);
    expect(() => martensitePlateauHardnessHrc(2.5)).toThrow(InputError);
  });
});
