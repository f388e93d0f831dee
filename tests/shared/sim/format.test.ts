import { describe, expect, it } from "vitest";
import { formatScientific } from "@shared/sim/alloy/format";

describe("formatScientific", () => {
  it("writes large and small values as powers of ten and keeps values near 1 plain", () => {
    expect(formatScientific(32_000)).toBe("3.2 × 10⁴");
    expect(formatScientific(0.00042)).toBe("4.2 × 10⁻⁴");
    expect(formatScientific(6835)).toBe("6,835"); // whole numbers keep their digits
  });

  it("uses a power of ten for every value when asked (one column reads alike)", () => {
    expect(formatScientific(6835, 2, true)).toBe("6.8 × 10³");
    expect(formatScientific(1.3e6, 2, true)).toBe("1.3 × 10⁶");
    expect(formatScientific(42, 2, true)).toBe("4.2 × 10¹");
  });
});
