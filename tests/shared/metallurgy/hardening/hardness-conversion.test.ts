import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { InputError } from "@shared/metallurgy/errors";
import { hardnessConversionTag, HRC_TO_HV_TABLE, hrcToHv, hvToHrc } from "@shared/metallurgy/hardening";

const within = (actual: number, expected: number, tol: number) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tol);

describe("hrcToHv / hvToHrc (ASTM E140 Table 1, non-austenitic steels)", () => {
  it("reproduces the table of science-reference §2.3", () => {
    // [Mem] science-reference §2.3, "check against E140": the primary source (ASTM E140) is paywalled and was
    // not checked; a third-party code table citing E140-12b agrees at 68, 65, 60, 55 and 50 HRC.
    const rows: [number, number][] = [[50, 513], [55, 595], [58, 653], [60, 697], [62, 746], [63, 772], [64, 800], [65, 832], [66, 865], [67, 900], [68, 940]];
    for (const [hrc, hv] of rows) {
      expect(hrcToHv(hrc)).toBe(hv);
      expect(hvToHrc(hv)).toBe(hrc);
    }
  });

  it("interpolates linearly between rows", () => {
    within(hrcToHv(61.5), (720 + 746) / 2, 1e-9); // 61 → 720 [Mem, from memory], 62 → 746 [Mem, §2.3]
    within(hvToHrc(733), 61.5, 1e-9);
    within(hrcToHv(44.4), 434 + 0.4 * 12, 1e-9); // lower rows [Mem, from memory]: 44 → 434, 45 → 446
  });

  it("is strictly increasing and inverts itself", () => {
    for (let i = 1; i < HRC_TO_HV_TABLE.length; i++) {
      expect(HRC_TO_HV_TABLE[i][0]).toBeGreaterThan(HRC_TO_HV_TABLE[i - 1][0]);
      expect(HRC_TO_HV_TABLE[i][1]).toBeGreaterThan(HRC_TO_HV_TABLE[i - 1][1]);
    }
    fc.assert(
      fc.property(fc.double({ min: 20, max: 68, noNaN: true }), (hrc) => {
        within(hvToHrc(hrcToHv(hrc)), hrc, 1e-9);
      }),
    );
  });

  it("tags its rows", () => {
    expect(hardnessConversionTag(60)).toMatch(/science-reference/);
    expect(hardnessConversionTag(40)).toMatch(/from memory/);
  });

  it("rejects values outside the table", () => {
    expect(() => hrcToHv(19.9)).toThrow(InputError);
    expect(() => hrcToHv(68.1)).toThrow(InputError);
    expect(() => hvToHrc(950)).toThrow(InputError);
    expect(() => hvToHrc(Number.NaN)).toThrow(InputError);
  });
});
