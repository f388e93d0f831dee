import { describe, expect, it } from "vitest";
import { paramsSchema, parseIngotSimParams, INGOT_SIM_DEFAULTS } from "@shared/sim/ingot/params";

describe("ingot parameters (contract with content/AUTHORING.md)", () => {
  it("accepts every documented preset name and value range", () => {
    for (const preset of [
      { grade: "A11", sizeMm: 1500, mould: "water-cooled", mixing: 1, element: "Si" },
      { C: 1, Cr: 5, V: 4, Mo: 1, Mn: 0.5, Si: 0.3, sizeMm: 50, mould: "metal", mixing: 0, element: "C" },
      { mould: "sand", element: "Mo" },
      {},
    ]) {
      expect(paramsSchema.safeParse(preset).success, JSON.stringify(preset)).toBe(true);
    }
  });

  it("rejects unknown keys, unknown grades and values outside the documented ranges", () => {
    for (const bad of [{ sizeMm: 49 }, { sizeMm: 1501 }, { mixing: 1.2 }, { mould: "die" }, { element: "W" }, { grade: "X1" }, { size: 300 }]) {
      expect(paramsSchema.safeParse(bad).success, JSON.stringify(bad)).toBe(false);
    }
  });

  it("fills the defaults and the default grade when nothing is given", () => {
    const p = parseIngotSimParams(undefined);
    expect(p).toMatchObject({ ...INGOT_SIM_DEFAULTS, gradeId: "D2" });
    expect(p.composition.Cr).toBe(11.5);
  });

  it("maps vanadium by default only where the steel has some; a plain carbon steel opens on carbon", () => {
    expect(parseIngotSimParams({ grade: "D2" }).element).toBe("V");
    expect(parseIngotSimParams({ grade: "1095" }).element).toBe("C");
    expect(parseIngotSimParams({ C: 1, Cr: 1.5 }).element).toBe("C");
    // A chosen element always wins.
    expect(parseIngotSimParams({ grade: "1095", element: "Mn" }).element).toBe("Mn");
  });

  it("uses exactly the typed composition when elements are given without a grade", () => {
    const p = parseIngotSimParams({ C: 1, V: 4 });
    expect(p.composition).toEqual({ C: 1, V: 4 });
    expect(p.gradeId).toBeNull();
  });

  it("overrides a grade's element and then reports the alloy as custom", () => {
    const p = parseIngotSimParams({ grade: "A11", V: 3 });
    expect(p.composition.V).toBe(3);
    expect(p.composition.Cr).toBe(5.25);
    expect(p.gradeId).toBeNull();
    expect(parseIngotSimParams({ grade: "A11", V: 9.75 }).gradeId).toBe("A11");
  });
});
