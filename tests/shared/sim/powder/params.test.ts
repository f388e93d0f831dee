import { describe, expect, it } from "vitest";
import { paramsSchema as powderSchema, parsePowderParams } from "@shared/sim/powder/params";

describe("powder parameters (contract with content/AUTHORING.md)", () => {
  it("accepts the documented names at their range ends", () => {
    const low = { grade: "M2", medianDiameterUm: 10, geometricStdDev: 1.2, gas: "Ar", gasVelocityMPerS: 0, superheatC: 0, undercoolingK: 0 };
    const high = { medianDiameterUm: 300, geometricStdDev: 3, gas: "N2", gasVelocityMPerS: 300, superheatC: 300, undercoolingK: 300 };
    expect(powderSchema.safeParse(low).success).toBe(true);
    expect(powderSchema.safeParse(high).success).toBe(true);
  });

  it("rejects out-of-range values and unknown keys", () => {
    for (const bad of [{ medianDiameterUm: 9 }, { geometricStdDev: 1.1 }, { gas: "He" }, { superheatC: -1 }, { undercoolingK: 301 }, { d50: 80 }]) {
      expect(powderSchema.safeParse(bad).success, JSON.stringify(bad)).toBe(false);
    }
  });

  it("resolves the default high-vanadium grade's composition", () => {
    const p = parsePowderParams({});
    expect(p.grade).toBe("A11");
    expect(p.composition.V).toBe(9.75);
  });
});
