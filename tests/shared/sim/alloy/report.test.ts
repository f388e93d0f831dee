/**
 * The alloy explorer's figures: which core function feeds which figure, with which state
 * (bulk, annealed matrix or hardened solution), and that bad inputs become messages, not NaNs.
 * Check values come from science-reference (section named beside each assertion).
 */
import { describe, expect, it } from "vitest";
import { alloyReport } from "@shared/sim/alloy/report";
import { resolveAlloy, type AlloySpec } from "@shared/sim/alloy/params";
import { typicalAustenitizingTempC } from "@shared/sim/alloy/austenitizing";
import { describeComparison } from "@shared/sim/alloy/summary";

const report = (spec: AlloySpec, austenitizingTempC: number | null = null, coldTreatmentC = -80) =>
  alloyReport(resolveAlloy(spec), { austenitizingTempC, coldTreatmentC });

describe("alloy report", () => {
  it("applies the standard's stainless definition to the bulk composition", () => {
    // EN 10088-1: Cr ≥ 10.5 and C ≤ 1.2 (science-reference §1a check 1).
    expect(report({ grade: "440C" }).figures.stainless.value).toBe("Yes");
    expect(report({ grade: "D2" }).figures.stainless.value).toBe("No"); // 1.55 % C
    expect(report({ name: "edge", Cr: 10.5, C: 0.08 }).figures.stainless.value).toBe("Yes");
    expect(report({ name: "edge", Cr: 10.4, C: 0.05 }).figures.stainless.value).toBe("No");
  });

  it("gives PREN of the bulk and of the hardened matrix", () => {
    const r = report({ name: "316-like", Cr: 17, Mo: 2.5, N: 0.05, C: 0.05, Ni: 12 });
    // PREN = Cr + 3.3(Mo + 0.5W) + 16N → 26.05 (science-reference §1d check 2).
    expect(r.numbers.prenBulk).toBeCloseTo(26.05, 3);
    const c440 = report({ grade: "440C" });
    expect(c440.numbers.prenBulk).toBeCloseTo(17 + 3.3 * 0.5, 6);
    // Carbides hold chromium: the matrix value is lower than the bulk one.
    expect(c440.numbers.prenMatrix!).toBeLessThan(c440.numbers.prenBulk!);
  });

  it("frees chromium and carbon into the matrix when carbides dissolve at the hardening temperature", () => {
    const low = report({ grade: "440C" }, 950);
    const high = report({ grade: "440C" }, 1150);
    expect(high.numbers.freeChromiumHardened!).toBeGreaterThan(low.numbers.freeChromiumHardened!);
    expect(high.numbers.totalCarbideVolumePct!.hardened).toBeLessThan(low.numbers.totalCarbideVolumePct!.hardened);
    // Annealed 440C-type: M7C3 13.38 vol% (science-reference §2.2 check 4; Mn and Si do not enter carbides).
    expect(low.numbers.totalCarbideVolumePct!.annealed).toBeCloseTo(13.38, 1);
    // More carbon in solution lowers Ms and leaves more austenite (Andrews; Koistinen–Marburger, §2.4).
    expect(high.numbers.msC!).toBeLessThan(low.numbers.msC!);
    expect(high.numbers.retainedAusteniteRoom!).toBeGreaterThan(low.numbers.retainedAusteniteRoom!);
  });

  it("reduces retained austenite with a colder treatment", () => {
    const dryIce = report({ grade: "D2" }, null, -78);
    const nitrogen = report({ grade: "D2" }, null, -196);
    expect(nitrogen.numbers.retainedAusteniteCold!).toBeLessThan(dryIce.numbers.retainedAusteniteCold!);
    expect(nitrogen.numbers.retainedAusteniteRoom).toBe(dryIce.numbers.retainedAusteniteRoom);
  });

  it("ranks a vanadium-carbide steel high on edge retention and slow on aluminium oxide but not on diamond", () => {
    const a11 = report({ grade: "A11" });
    const plain = report({ grade: "1080" });
    expect(a11.numbers.edgeRetention!).toBeGreaterThan(plain.numbers.edgeRetention!);
    // VC (≈2800 HV) is harder than Al2O3 (≈2000 HV) but not than diamond (science-reference §2.6, §6).
    expect(a11.numbers.sharpeningAlumina!).toBeGreaterThan(2 * a11.numbers.sharpeningDiamond!);
    expect(a11.numbers.carbides.some((b) => b.type === "MC" && b.hardenedVolumePct > 10)).toBe(true);
  });

  it("computes the ideal critical diameter inside the A255 factor ranges and explains why not outside", () => {
    // 5160-type: DI 3.291 in (science-reference §5.3 check 4).
    const r5160 = report({ grade: "5160" });
    expect(r5160.figures["ideal-diameter"].value).toMatch(/^3\.29 in/);
    const r440 = report({ grade: "440C" });
    expect(r440.figures["ideal-diameter"].status).toBe("outside");
    expect(r440.figures["ideal-diameter"].warnings[0]).toMatch(/composition\.C|composition\.Cr/);
  });

  it("shows the last liquid enriched for both ingot and powder, over very different distances", () => {
    const d = report({ grade: "D2" }).figures.freezing;
    expect(d.value).toMatch(/°C$/);
    expect(d.details.some((line) => line.startsWith("ingot: last liquid V"))).toBe(true);
    expect(d.details.some((line) => line.startsWith("powder: last liquid V"))).toBe(true);
  });

  it("turns an alloy outside the carbide model into messages instead of numbers or NaN", () => {
    const r = report({ name: "cast iron-ish", C: 2.5, Cr: 30, V: 15, W: 20, Mo: 10 });
    for (const f of Object.values(r.figures)) {
      expect(f.value).not.toMatch(/NaN/);
      if (f.status === "outside") expect(f.warnings.length).toBeGreaterThan(0);
    }
    const hardness = report({ name: "very high C in solution", C: 2.2 }, 1200).figures.hardness;
    // Above 0.7 % C in solution the estimate is held at the A255 0.7 % value and flagged (Krauss 1999 plateau).
    expect(hardness.status).toBe("warning");
    expect(hardness.warnings.join(" ")).toMatch(/held at the 0.7 % value/);
  });

  it("words a comparison so that moving a slider changes the text", () => {
    const a = describeComparison([report({ grade: "440C" }), report({ grade: "D2" })]);
    expect(a).toMatch(/^Comparing AISI 440C and AISI D2\./);
    const b = describeComparison([report({ name: "440C mod", C: 1.2, Cr: 17, Mo: 0.5 }), report({ grade: "D2" })]);
    expect(b).not.toBe(a);
  });
});

describe("typical hardening temperature", () => {
  it("follows the family of the composition (common practice)", () => {
    expect(typicalAustenitizingTempC({ C: 0.85, Cr: 4.1, Mo: 5, W: 6.4, V: 1.9 }).family).toBe("high-speed steel");
    expect(typicalAustenitizingTempC({ C: 1.075, Cr: 17 }).tempC).toBe(1050);
    expect(typicalAustenitizingTempC({ C: 1.55, Cr: 11.5 }).family).toMatch(/tool steel/);
    expect(typicalAustenitizingTempC({ C: 2.45, Cr: 5.25, V: 9.75 }).family).toBe("high-vanadium tool steel");
    expect(typicalAustenitizingTempC({ C: 0.95 }).tempC).toBe(800);
  });
});
