import { describe, expect, it } from "vitest";
import { allocateCarbides, findGrade } from "@shared/metallurgy";
import {
  coarsenedMeanRadiusUm,
  initialState,
  INITIAL_MEAN_RADIUS_UM,
  lswRateUm3PerH,
  parseCarbideParams,
  selectVisible,
  setHours,
  targetFractions,
} from "@shared/sim/carbides";

/** Half the area of the largest drawn particle, as a fraction of the field: the stopping error of the sampler. */
function samplingTolerance(radii: Float64Array, fieldUm: number): number {
  let max = 0;
  for (const r of radii) max = Math.max(max, r);
  return (Math.PI * max * max) / (fieldUm * fieldUm) / 2 + 1e-9;
}

describe("carbide field", () => {
  it("draws each carbide's volume fraction of the CARB-1 allocation within sampling error (annealed D2, A11, 52100)", () => {
    for (const grade of ["D2", "A11", "52100"]) {
      const s = initialState(parseCarbideParams({ grade, state: "annealed" }));
      const allocation = allocateCarbides(findGrade(grade)!.composition);
      const tol = samplingTolerance(s.visible.radiusUm, s.base.widthUm);
      for (const phase of allocation.phases) {
        // Delesse: the area fraction of a random section equals the volume fraction.
        expect(Math.abs((s.visible.areaFraction[phase.type] ?? 0) - phase.volumePct / 100)).toBeLessThanOrEqual(tol);
      }
    }
  });

  it("keeps only the carbides left after austenitizing, fewer at a higher temperature (440C)", () => {
    const annealed = initialState(parseCarbideParams({ grade: "440C", state: "annealed" }));
    const at1000 = initialState(parseCarbideParams({ grade: "440C", austenitizingTempC: 1000 }));
    const at1150 = initialState(parseCarbideParams({ grade: "440C", austenitizingTempC: 1150 }));
    const m7 = (s: typeof annealed) => s.visible.areaFraction.M7C3 ?? 0;
    expect(m7(at1000)).toBeLessThan(m7(annealed));
    expect(m7(at1150)).toBeLessThan(m7(at1000));
    const tol = samplingTolerance(at1000.visible.radiusUm, at1000.base.widthUm);
    expect(Math.abs(m7(at1000) - at1000.population.phases.find((p) => p.type === "M7C3")!.volumePct / 100)).toBeLessThanOrEqual(tol);
    // More carbon in solution after the hotter austenitize gives a harder martensite (up to the 0.7 % C cap).
    expect(at1150.population.carbonInSolutionMassPct).toBeGreaterThan(at1000.population.carbonInSolutionMassPct);
  });

  it("coarsens by the LSW law: fewer, larger particles at the same area fraction", () => {
    const s = initialState(parseCarbideParams({ grade: "D2", state: "annealed", austenitizingTempC: 1100 }));
    const before = s.visible.count;
    const meanRadius = (type: "M7C3") => {
      let sum = 0, n = 0;
      for (let k = 0; k < s.visible.count; k++) if (s.base.types[s.base.typeIndex[s.visible.index[k]]] === type) { sum += s.visible.radiusUm[k]; n++; }
      return sum / n;
    };
    const r0 = meanRadius("M7C3");
    setHours(s, 50);
    const growth = coarsenedMeanRadiusUm("M7C3", 1100, 50) / INITIAL_MEAN_RADIUS_UM.M7C3;
    expect(growth).toBeGreaterThan(1.2);
    expect(s.visible.count).toBeLessThan(before);
    // Particles kept at random: the drawn mean grows by the LSW factor (within 20 % for a sample this size).
    expect(meanRadius("M7C3") / r0).toBeGreaterThan(growth * 0.8);
    expect(meanRadius("M7C3") / r0).toBeLessThan(growth * 1.2);
    const target = targetFractions(s.population).M7C3!;
    expect(Math.abs((s.visible.areaFraction.M7C3 ?? 0) - target)).toBeLessThanOrEqual(samplingTolerance(s.visible.radiusUm, s.base.widthUm) * 2);
  });

  it("vanadium carbide coarsens more slowly than chromium carbide (slower V diffusion)", () => {
    // Diffusion data of science-reference §2.5: D(V) < D(Cr) in austenite at 1100 °C [Checked].
    expect(lswRateUm3PerH("MC", 1100)).toBeLessThan(lswRateUm3PerH("M7C3", 1100) / 2);
    // …and both speed up with temperature (Arrhenius, Q ≈ 246–272 kJ/mol: × 5–7 per 100 K, §2.5 check 3).
    expect(lswRateUm3PerH("M7C3", 1100) / lswRateUm3PerH("M7C3", 1000)).toBeCloseTo(5.433, 2);
  });

  it("never draws overlapping particles, even after coarsening", () => {
    const s = initialState(parseCarbideParams({ grade: "A11", coarseningHours: 80 }));
    const { base, visible } = s;
    for (let a = 0; a < visible.count; a++) {
      for (let b = a + 1; b < visible.count; b++) {
        const i = visible.index[a], j = visible.index[b];
        let dx = Math.abs(base.xUm[i] - base.xUm[j]);
        let dy = Math.abs(base.yUm[i] - base.yUm[j]);
        dx = Math.min(dx, base.widthUm - dx);
        dy = Math.min(dy, base.heightUm - dy);
        expect(Math.hypot(dx, dy)).toBeGreaterThanOrEqual(visible.radiusUm[a] + visible.radiusUm[b] - 1e-9);
      }
    }
  });

  it("is deterministic for a seed", () => {
    const a = initialState(parseCarbideParams({ grade: "M2", seed: 9 }));
    const b = initialState(parseCarbideParams({ grade: "M2", seed: 9 }));
    const c = initialState(parseCarbideParams({ grade: "M2", seed: 10 }));
    expect(Array.from(a.visible.index)).toEqual(Array.from(b.visible.index));
    expect(Array.from(a.base.xUm)).not.toEqual(Array.from(c.base.xUm));
    expect(selectVisible(a.base, targetFractions(a.population), a.growth).count).toBe(a.visible.count);
  });
});
