import { describe, expect, it } from "vitest";
import { alloyBalance, carbideAreaFraction } from "@shared/sim/passive-film";

describe("alloyBalance: free chromium left for the film", () => {
  it("uses the core's free-Cr computation (420-type, 0.20 C, 13 Cr as Cr23C6 → 10.03 % free Cr)", () => {
    // science-reference §1c check 2 [Computed]
    const b = alloyBalance({ crMassPct: 13, cMassPct: 0.2, carbide: "M23C6" });
    expect(b.freeCrMassPct).toBeCloseTo(10.03, 2);
    expect(b.allChromiumBound).toBe(false);
  });

  it("reports all Cr bound when the carbide would need more Cr than there is (440C-type as Cr23C6)", () => {
    // science-reference §1c check 3: 1.075 C as Cr23C6 needs 17.84 % Cr > 17 % [Computed]
    const b = alloyBalance({ crMassPct: 17, cMassPct: 1.075, carbide: "M23C6" });
    expect(b.allChromiumBound).toBe(true);
    expect(b.freeCrMassPct).toBe(0);
    expect(b.crAtomFraction).toBe(0);
    expect(b.tiedCrMassPct).toBe(17);
  });

  it("turns carbide mass into a slightly larger area fraction (carbides are lighter than the matrix)", () => {
    // Delesse: area fraction = volume fraction; densities of science-reference §2.1/§2.2.
    const f = carbideAreaFraction(10, "M7C3");
    expect(f).toBeGreaterThan(0.1);
    expect(f).toBeCloseTo((0.1 / 6.92) / (0.1 / 6.92 + 0.9 / 7.85), 6);
  });
});
