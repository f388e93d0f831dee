import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { alloyLinkQuery, decodeAlloyParams, decodeAlloySpec, encodeAlloyParams, encodeAlloySpec } from "@shared/sim/alloy/url-state";
import { compositionText } from "@shared/sim/alloy/format";
import { paramsSchema, resolveAlloy, toCustomSpec, type AlloySpec } from "@shared/sim/alloy/params";
import { ELEMENT_RANGE_MASS_PCT } from "@shared/sim/alloy/element-ranges";

describe("alloy explorer URL state", () => {
  it("writes a grade preset as its bare id and a custom alloy as name plus element tokens", () => {
    expect(encodeAlloySpec({ grade: "440C" })).toBe("440C");
    expect(encodeAlloySpec({ name: "Cinderfield test", C: 1.2, Cr: 14, V: 2 })).toBe("Cinderfield test_C1.2_Cr14_V2");
    expect(encodeAlloySpec({ name: "Pure iron" })).toBe("Pure iron_");
  });

  it("round-trips a three-alloy comparison and a non-default cold treatment", () => {
    const params = paramsSchema.parse({
      alloys: [{ grade: "440C" }, { name: "A_b 50% more", C: 1.05, Cr: 17.5, N: 0.12 }, { name: "440C" }],
      coldTreatmentC: -196,
    });
    const query = encodeAlloyParams(params);
    const decoded = decodeAlloyParams(query);
    expect(decoded.problems).toEqual([]);
    expect(decoded.params).toEqual(params);
    // A custom alloy named like a grade stays custom.
    expect(decoded.params?.alloys[2]).toEqual({ name: "440C" });
  });

  it("leaves the default cold treatment out of the link", () => {
    expect(encodeAlloyParams(paramsSchema.parse({ alloys: [{ grade: "D2" }] }))).toBe("a=D2");
  });

  it("returns null params when the URL holds no alloy state", () => {
    expect(decodeAlloyParams("?foo=1").params).toBeNull();
  });

  it("drops unreadable or out-of-range entries and says so, keeping the rest", () => {
    const decoded = decodeAlloyParams("a=440C&a=NoSuchGrade&a=Mine_C9_Cr1&a=Mine2_Xx3&a=D2");
    expect(decoded.params?.alloys).toEqual([{ grade: "440C" }, { grade: "D2" }]);
    expect(decoded.problems).toHaveLength(3);
  });

  it("keeps at most three alloys", () => {
    const decoded = decodeAlloyParams("a=440C&a=D2&a=M2&a=A11");
    expect(decoded.params?.alloys).toHaveLength(3);
    expect(decoded.problems[0]).toMatch(/Only 3/);
  });

  it("resets an out-of-range cold treatment but keeps the alloys", () => {
    const decoded = decodeAlloyParams("a=M2&cold=40");
    expect(decoded.params).toEqual({ alloys: [{ grade: "M2" }], coldTreatmentC: -80 });
    expect(decodeAlloyParams("a=M2&aus=1500").params?.austenitizingTempC).toBeUndefined();
    expect(decodeAlloyParams("a=M2&aus=1180").params?.austenitizingTempC).toBe(1180);
    expect(decoded.problems).toHaveLength(1);
  });

  it("round-trips any valid custom alloy (property)", () => {
    const elementArb = (el: keyof typeof ELEMENT_RANGE_MASS_PCT) =>
      fc.option(fc.integer({ min: 1, max: Math.round(ELEMENT_RANGE_MASS_PCT[el].max * 100) }).map((n) => n / 100), { nil: undefined });
    const specArb = fc.record({
      name: fc.string({ minLength: 1, maxLength: 40 }).filter((s) => s.trim().length > 0 && s.trim() === s),
      C: elementArb("C"),
      Cr: elementArb("Cr"),
      V: elementArb("V"),
      N: elementArb("N"),
    });
    fc.assert(
      fc.property(specArb, (raw) => {
        const spec = Object.fromEntries(Object.entries(raw).filter(([, v]) => v !== undefined)) as AlloySpec;
        expect(decodeAlloySpec(encodeAlloySpec(spec))).toEqual(spec);
      }),
      { numRuns: 300 },
    );
  });
});

describe("alloy specs", () => {
  it("resolves a grade to its label and nominal composition", () => {
    const alloy = resolveAlloy({ grade: "440C" });
    expect(alloy.name).toBe("AISI 440C");
    expect(alloy.composition.Cr).toBe(17);
  });

  it("turns a grade into an editable custom alloy with the same composition", () => {
    const custom = toCustomSpec({ grade: "D2" });
    expect(custom.name).toBe("AISI D2 (modified)");
    expect(resolveAlloy(custom).composition).toEqual(resolveAlloy({ grade: "D2" }).composition);
  });

  it("rejects more than three alloys, unknown keys and unknown grades", () => {
    expect(paramsSchema.safeParse({ alloys: [{ grade: "D2" }, { grade: "D2" }, { grade: "D2" }, { grade: "D2" }] }).success).toBe(false);
    expect(paramsSchema.safeParse({ alloys: [{ grade: "D2", C: 1 }] }).success).toBe(false);
    expect(paramsSchema.safeParse({ alloys: [{ grade: "X9" }] }).success).toBe(false);
    expect(paramsSchema.safeParse({ alloys: [{ name: "hot", Cr: 31 }] }).success).toBe(false);
  });
});

describe("links that open alloys in the explorer (lesson task alloys)", () => {
  it("opens the given alloys, at most three, and decodes back to the same alloys at default settings", () => {
    const specs: AlloySpec[] = [
      { name: "Task A_1", C: 1.2, Cr: 12.5 },
      { grade: "D2" },
      { name: "Task 100%", V: 9.75, C: 2.45 },
      { grade: "440C" },
    ];
    const query = alloyLinkQuery(specs);
    const decoded = decodeAlloyParams(query);
    expect(decoded.problems).toEqual([]);
    expect(decoded.params?.alloys).toEqual(specs.slice(0, 3));
    expect(decoded.params?.coldTreatmentC).toBe(paramsSchema.parse({}).coldTreatmentC);
    expect(new URLSearchParams(query).has("cold")).toBe(false);
  });

  it("writes a composition as the elements present, in the explorer's order", () => {
    expect(compositionText({ Mo: 4, C: 1.05, Cr: 14, V: 0 })).toBe("1.05\u00a0C, 14\u00a0Cr, 4\u00a0Mo");
    expect(compositionText({})).toBe("pure iron");
  });
});
