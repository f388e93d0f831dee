/**
 * The science core's stated limits reach the screens that use them: the λ2 carbon clamp (ingot,
 * powder, alloy explorer), the eutectic bound of the ingot's last liquid, chromium and the binary
 * Acm line, and the high-speed-steel carbon in solution (alloy explorer, notebook). Sources of the
 * numbers are named beside each check; the core's own check values are tested in tests/shared/metallurgy.
 */
import { describe, expect, it } from "vitest";
import { armSpacingCarbonClampWarning, secondaryArmSpacingUm } from "@shared/metallurgy/solidification/arm-spacing";
import { chromiumAcmWarning, HIGH_SPEED_STEEL_WARNING } from "@shared/metallurgy/carbides/austenitizing-dissolution";
import { runIngot } from "@shared/sim/ingot/run";
import { parseIngotSimParams } from "@shared/sim/ingot/params";
import { computePowderClasses } from "@shared/sim/powder/classes";
import { parsePowderParams } from "@shared/sim/powder/params";
import { alloyReport, FIGURE_INFO } from "@shared/sim/alloy/report";
import { resolveAlloy, type AlloySpec } from "@shared/sim/alloy/params";
import { computeHardening } from "@shared/api/notebook-compute";

const report = (spec: AlloySpec, austenitizingTempC: number | null = null) => alloyReport(resolveAlloy(spec), { austenitizingTempC, coldTreatmentC: -80 });

describe("λ2 above the fit's 1 % C limit (A11, 2.45 % C)", () => {
  const a11 = runIngot(parseIngotSimParams({ grade: "A11", sizeMm: 300, mould: "sand" }));

  it("the ingot shows the clamped spacing and the core's warning once", () => {
    const n = a11.cells;
    // Carbon term held at 1.0 (science-reference §3.4 limit): λ2 = 143.9·CR^−0.3616, hundreds of µm in a
    // sand-cast 300 mm ingot — not the ≈ 8 µm the literal fit gives at 2.45 % C.
    for (const i of [1, n >> 1, n - 1]) {
      expect(a11.final.armSpacingUm[i]).toBeCloseTo(secondaryArmSpacingUm(a11.final.coolingRateCPerS[i], 1.0).value, 9);
      expect(a11.final.armSpacingUm[i]).toBeGreaterThan(100);
    }
    expect(a11.warnings.filter((w) => w === armSpacingCarbonClampWarning(2.45))).toHaveLength(1);
  });

  it("the powder size-class table and the alloy explorer's freezing figure carry the warning", () => {
    const classes = computePowderClasses(parsePowderParams({ grade: "A11" }));
    // The class table lists the first four distinct warnings (src/lab/powder/class-table.tsx).
    const shown = [...new Set(classes.classes.flatMap((c) => c.warnings))].slice(0, 4);
    expect(shown).toContain(armSpacingCarbonClampWarning(2.45));
    expect(report({ grade: "A11" }).figures.freezing.warnings).toContain(armSpacingCarbonClampWarning(2.45));
  });
});

describe("the ingot's last liquid is bounded at the eutectic", () => {
  it("D2, 300 mm, sand, fully mixed: no centre spike, carbon at or below 4.3 %, mass conserved", () => {
    // Before the bound this case put ≈ 69 × the melt's carbon into the centre node (≈ 107 % C).
    const run = runIngot(parseIngotSimParams({ grade: "D2", sizeMm: 300, mould: "sand", mixing: 1 }));
    const n = run.cells;
    for (const el of run.tracked) {
      const mean = run.final.meanMassPct[el]!;
      expect(mean[n - 1] / mean[n - 2]).toBeLessThan(1.01);
    }
    // Fe–C eutectic 4.30 % C (science-reference §5.2 [Checked]).
    expect(Math.max(...run.final.meanMassPct.C!)).toBeLessThanOrEqual(4.3 + 1e-9);
    expect(run.warnings.join(" ")).toMatch(/reached the Fe–C eutectic carbon/);
  });
});

describe("hardening limits shown beside the hardness", () => {
  it("52100: the explorer's hardness figure and note say chromium's effect on Acm is not modelled", () => {
    const r = report({ grade: "52100" }, 845);
    // CARB-1 cementite Cr share y3 = 0.063 for 52100-type ([Computed] science-reference §2.2 check 2).
    expect(r.figures.hardness.warnings).toContain(chromiumAcmWarning(1.45, 0.063));
    expect(r.figures.hardness.status).toBe("warning");
    expect(FIGURE_INFO.hardness.method).toMatch(/chromium's effect is not modelled/);
    // Same carbon in solution as plain Fe–1.0C: all cementite dissolves above Acm(1.0) = 799.3 °C on the binary line
    // ([Computed] science-reference §5.2 check 4), chromium or not.
    const plain = report({ name: "Fe-1C", C: 1.0 }, 845);
    expect(r.figures.hardness.details[0]).toBe("1.00 % C in solution at 845 °C");
    expect(plain.figures.hardness.details[0]).toBe(r.figures.hardness.details[0]);
    expect(plain.figures.hardness.warnings.join(" ")).not.toMatch(/Chromium/);
  });

  it("M2: the explorer and the notebook show that the high-speed-steel value reads low", () => {
    const m2 = { C: 0.85, Cr: 4.1, Mo: 5.0, W: 6.4, V: 1.9, Mn: 0.3, Si: 0.3 };
    const r = report({ grade: "M2" }, 1200);
    expect(r.figures.hardness.warnings).toContain(HIGH_SPEED_STEEL_WARNING);
    // A255 polynomial at ≈ 0.35 % C in solution (§2.3 [Checked]; trace in austenitizing-dissolution.test.ts).
    expect(r.numbers.hardnessHrc!).toBeGreaterThan(52.5);
    expect(r.numbers.hardnessHrc!).toBeLessThan(54.5);
    expect(FIGURE_INFO.hardness.method).toMatch(/high-speed steels/);
    const notebook = computeHardening({ composition: m2, austenitizeC: 1200, coldTreatment: "none" });
    expect(notebook.warnings).toContain(HIGH_SPEED_STEEL_WARNING);
  });
});
