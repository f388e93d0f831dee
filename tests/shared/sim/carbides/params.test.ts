import { describe, expect, it } from "vitest";
import { CARBIDE_PARAM_KEYS, parseCarbideParams, resolveAlloy } from "@shared/sim/carbides";

describe("carbide params (contract with content/AUTHORING.md)", () => {
  it("knows every AUTHORING.md parameter name", () => {
    for (const key of ["grade", "C", "Cr", "V", "W", "Mo", "state", "austenitizingTempC", "coarseningHours", "view", "abrasive"]) {
      expect(CARBIDE_PARAM_KEYS).toContain(key);
    }
  });

  it("opens a grade with its usual hardening temperature, and 440C when nothing is given", () => {
    const d2 = parseCarbideParams({ grade: "D2", view: "edge", abrasive: "diamond" });
    expect(d2).toMatchObject({ grade: "D2", state: "hardened", coarseningHours: 0, view: "edge", abrasive: "diamond" });
    // Usual D2 hardening temperature ≈ 1010–1030 °C: common practice, from memory.
    expect(resolveAlloy(d2).austenitizingTempC).toBe(1020);
    expect(parseCarbideParams({}).grade).toBe("440C");
    expect(resolveAlloy(parseCarbideParams({ grade: "D2", austenitizingTempC: 980 })).austenitizingTempC).toBe(980);
  });

  it("lets explicit elements override the grade, and labels the result as modified or custom", () => {
    const modified = resolveAlloy(parseCarbideParams({ grade: "D2", V: 4 }));
    expect(modified.composition.V).toBe(4);
    expect(modified.composition.Cr).toBe(11.5); // from grades.ts
    expect(modified.label).toMatch(/modified/);
    const custom = resolveAlloy(parseCarbideParams({ C: 1, Cr: 5 }));
    expect(custom.composition).toEqual({ C: 1, Cr: 5 });
    expect(custom.label).toBe("Custom steel");
  });

  it("rejects values outside the contract", () => {
    expect(() => parseCarbideParams({ grade: "X99" })).toThrow();
    expect(() => parseCarbideParams({ austenitizingTempC: 700 })).toThrow();
    expect(() => parseCarbideParams({ austenitizingTempC: 1250 })).toThrow();
    expect(() => parseCarbideParams({ coarseningHours: 101 })).toThrow();
    expect(() => parseCarbideParams({ abrasive: "cbn" })).toThrow();
    expect(() => parseCarbideParams({ view: "micrograph" })).toThrow();
    expect(() => parseCarbideParams({ carbon: 1 })).toThrow();
  });
});
