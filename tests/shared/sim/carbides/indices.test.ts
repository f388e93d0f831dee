import { describe, expect, it } from "vitest";
import { describeCarbides, gradeIndexPoint, initialState, parseCarbideParams, presetScatter, referencePoint } from "@shared/sim/carbides";

describe("wear indices of the presets", () => {
  it("ranks edge retention high-vanadium > 12 % Cr cold-work > plain carbon (model index)", () => {
    const eri = (g: string) => gradeIndexPoint(g, "hardened", "alumina").edgeRetention;
    expect(eri("A11")).toBeGreaterThan(eri("D2"));
    expect(eri("D2")).toBeGreaterThan(eri("1095"));
  });

  it("makes the compromise visible: the high-V steel is hardest to sharpen on aluminium oxide, not on diamond", () => {
    const alumina = presetScatter("hardened", "alumina");
    const diamond = presetScatter("hardened", "diamond");
    const a11 = (list: typeof alumina) => list.find((p) => p.gradeId === "A11")!.sharpeningEffort;
    expect(alumina).toHaveLength(8);
    expect(a11(alumina)).toBe(Math.max(...alumina.map((p) => p.sharpeningEffort)));
    expect(a11(diamond)).toBeLessThan(a11(alumina) / 3);
  });

  it("compares with a plain-carbon reference and says the numbers are model indices", () => {
    const s = initialState(parseCarbideParams({ grade: "A11" }));
    expect(s.reference.gradeId).toBe("1095");
    expect(s.reference).toEqual(referencePoint("hardened", "alumina"));
    expect(describeCarbides(s)).toMatch(/model indices, not lifetimes/);
  });
});
