import { describe, expect, it } from "vitest";
import { ABRASIVES } from "@shared/metallurgy";
import {
  cloneEdge,
  edgeMetrics,
  ensureEdge,
  ensureWornEdge,
  initialState,
  parseCarbideParams,
  step,
  strokesToRestore,
  wearCycles,
  type CarbideSimState,
} from "@shared/sim/carbides";

const wornTo = (state: CarbideSimState, widthUm: number) => {
  const edge = ensureEdge(state);
  for (let i = 0; i < 2000 && edgeMetrics(edge).tipWidthUm < widthUm; i++) wearCycles(edge, 10);
  return edge;
};

describe("edge wear by quartz", () => {
  it("starts sharp", () => {
    const m = edgeMetrics(ensureEdge(initialState(parseCarbideParams({ grade: "A11" }))));
    expect(m.sharp).toBe(true);
    expect(m.apexRecessionUm).toBe(0);
  });

  it("leaves hard vanadium carbides standing proud of the matrix (A11)", () => {
    const s = initialState(parseCarbideParams({ grade: "A11" }));
    const edge = ensureEdge(s);
    wearCycles(edge, 1500);
    // VC ≈ 2800 HV is far harder than quartz ≈ 1100 HV, the matrix is not (science-reference §2.1, §2.6).
    expect(edgeMetrics(edge).carbideProtrusionUm).toBeGreaterThan(0.3);
  });

  it("wears a carbide-free edge evenly (hardened 1095: all cementite dissolved, nothing stands proud)", () => {
    const s = initialState(parseCarbideParams({ grade: "1095" }));
    expect(s.visible.count).toBe(0);
    const edge = ensureEdge(s);
    wearCycles(edge, 300);
    expect(edgeMetrics(edge).carbideProtrusionUm).toBe(0);
    expect(edgeMetrics(edge).apexRecessionUm).toBeGreaterThan(2);
  });

  it("blunts a plain-carbon edge in fewer cycles than a high-vanadium one (same order as the edge-retention index)", () => {
    const cyclesToBlunt = (grade: string) => {
      const s = initialState(parseCarbideParams({ grade }));
      const edge = wornTo(s, 8);
      return { cycles: edge.cycles, eri: s.indices.edgeRetention };
    };
    const plain = cyclesToBlunt("1095");
    const highV = cyclesToBlunt("A11");
    expect(highV.eri).toBeGreaterThan(plain.eri);
    expect(highV.cycles).toBeGreaterThan(plain.cycles * 2);
  });
});

describe("sharpening", () => {
  it("restores a worn high-vanadium edge faster on diamond than on aluminium oxide (A11)", () => {
    const s = initialState(parseCarbideParams({ grade: "A11" }));
    const edge = wornTo(s, 8);
    const alumina = strokesToRestore(edge, ABRASIVES["aluminium-oxide"].typicalHv, 6000, 5);
    const diamond = strokesToRestore(edge, ABRASIVES.diamond.typicalHv, 6000, 5);
    expect(diamond).not.toBeNull();
    expect(alumina).not.toBeNull();
    // Trade observation (science-reference §6): aluminium-oxide stones cut VC-rich steels slowly.
    expect(diamond!).toBeLessThan(alumina! * 0.6);
  });

  it("takes the same strokes on any stone for a steel without hard carbides (hardened 1095)", () => {
    const s = initialState(parseCarbideParams({ grade: "1095" }));
    const edge = wornTo(s, 8);
    expect(strokesToRestore(edge, ABRASIVES["aluminium-oxide"].typicalHv, 6000, 5)).toBe(strokesToRestore(edge, ABRASIVES.diamond.typicalHv, 6000, 5));
  });

  it("the sharpening view wears a standard edge first, then strokes until the edge is sharp and stops", () => {
    const s = initialState(parseCarbideParams({ grade: "D2", view: "sharpen", abrasive: "diamond" }));
    const worn = ensureWornEdge(s);
    expect(edgeMetrics(worn).sharp).toBe(false);
    let running = true;
    for (let i = 0; i < 5000 && running; i++) running = step(s, 0.05, 4);
    expect(running).toBe(false);
    expect(edgeMetrics(s.edge!).sharp).toBe(true);
    expect(s.edge!.strokes).toBeGreaterThan(0);
    expect(edgeMetrics(s.wornEdge!).sharp).toBe(false);
    expect(cloneEdge(s.wornEdge!).strokes).toBe(0);
  });
});

describe("clock", () => {
  it("advances coarsening time in the field view and cutting cycles in the edge view", () => {
    const s = initialState(parseCarbideParams({ grade: "D2" }));
    expect(step(s, 0.5, 1)).toBe(true);
    expect(s.hours).toBeCloseTo(2, 6);
    s.params = { ...s.params, view: "edge" };
    step(s, 0.5, 1);
    expect(s.edge!.cycles).toBe(30);
  });
});
