import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { InputError } from "@shared/metallurgy/errors";
import { isStainless, STAINLESS_LIMITS } from "@shared/metallurgy/passivity";

describe("isStainless (EN 10088-1 definition)", () => {
  it("matches science-reference §1a check 1", () => {
    // [Checked] science-reference §1a check 1; EN 10088-1: Cr ≥ 10.5 and C ≤ 1.2
    expect(isStainless({ Cr: 10.5, C: 0.08 })).toBe(true);
    expect(isStainless({ Cr: 10.4, C: 0.05 })).toBe(false);
    expect(isStainless({ Cr: 17.0, C: 1.2 })).toBe(true);
    expect(isStainless({ Cr: 17.0, C: 1.25 })).toBe(false);
  });

  it("states the limits of the standard", () => {
    expect(STAINLESS_LIMITS).toEqual({ minChromiumMassPct: 10.5, maxCarbonMassPct: 1.2 }); // [Checked] EN 10088-1
  });

  it("agrees with the two limits for any valid composition", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 40, noNaN: true }), fc.double({ min: 0, max: 3, noNaN: true }), (cr, c) => {
        expect(isStainless({ Cr: cr, C: c })).toBe(cr >= 10.5 && c <= 1.2);
      }),
    );
  });

  it("rejects negative, non-finite and unknown entries with InputError", () => {
    expect(() => isStainless({ Cr: -1 })).toThrow(InputError);
    expect(() => isStainless({ C: -0.1, Cr: 12 })).toThrow(InputError);
    expect(() => isStainless({ Cr: Number.NaN })).toThrow(InputError);
    expect(() => isStainless({ Cr: 101 })).toThrow(InputError);
    expect(() => isStainless({ Xx: 1 } as never)).toThrow(InputError);
  });
});
