import { describe, expect, it } from "vitest";
import { createFrameView, findFronts, frameIndexAt, readFrame } from "@shared/sim/ingot/frames";
import { describeIngotFrame, describeIngotResult } from "@shared/sim/ingot/summary";
import { runIngot } from "@shared/sim/ingot/run";
import { parseIngotSimParams } from "@shared/sim/ingot/params";
import { boundaryLayerForMixing, REFERENCE_BOUNDARY_LAYER_M } from "@shared/sim/ingot/mixing";
import { coarseCarbideRisk, eutecticCarbonMassPct } from "@shared/sim/ingot/carbide-risk";
import { displayArmSpacingUm } from "@shared/sim/ingot/arm-spacing";
import { secondaryArmSpacingUm } from "@shared/metallurgy";

const run = runIngot(parseIngotSimParams({ grade: "D2", sizeMm: 200, mould: "metal" }));

describe("reading frames", () => {
  it("finds the frame at or before a time", () => {
    const times = Float64Array.from([0, 1, 2, 4]);
    expect(frameIndexAt(times, 4, -1)).toBe(0);
    expect(frameIndexAt(times, 4, 1.5)).toBe(1);
    expect(frameIndexAt(times, 4, 2)).toBe(2);
    expect(frameIndexAt(times, 4, 9)).toBe(3);
  });

  it("interpolates linearly between two recorded frames", () => {
    const n = run.cells;
    const f = 10;
    const t = 0.25 * run.frameTimeS[f] + 0.75 * run.frameTimeS[f + 1];
    const view = readFrame(run, t, "V", createFrameView(n));
    for (const i of [0, Math.floor(n / 2), n - 1]) {
      const expected = 0.25 * run.frameTempC[f * n + i] + 0.75 * run.frameTempC[(f + 1) * n + i];
      expect(view.tempC[i]).toBeCloseTo(expected, 3);
    }
    expect(view.poolMassPct).toBeCloseTo(0.25 * run.framePoolMassPct.V![f] + 0.75 * run.framePoolMassPct.V![f + 1], 6);
  });

  it("reports no solute map for an element the alloy does not contain", () => {
    const plain = runIngot(parseIngotSimParams({ grade: "1095", sizeMm: 100 }));
    const view = readFrame(plain, 10, "V");
    expect(view.meanMassPct).toBeNull();
    expect(view.poolMassPct).toBeNull();
  });

  it("places the fronts where the solid fraction crosses 1 and 0", () => {
    const positions = [0, 1, 2, 3, 4];
    const fronts = findFronts([1, 1, 0.5, 0, 0], positions, 4);
    expect(fronts.solidusFrontM).toBeCloseTo(1, 5); // node 1 is the last fully solid one
    expect(findFronts([1, 1, 1, 0.5, 0], positions, 4).solidusFrontM).toBeCloseTo(2, 5);
    expect(fronts.liquidusFrontM).toBeCloseTo(3, 5);
    expect(findFronts([0, 0, 0, 0, 0], positions, 4).sectionSolidFraction).toBe(0);
    expect(findFronts([1, 1, 1, 1, 1], positions, 4).sectionSolidFraction).toBeCloseTo(1, 12);
  });
});

describe("live summary", () => {
  it("describes the shell and the enriched pool while freezing, and the result at the end", () => {
    const mid = run.frameTimeS[Math.floor(run.frameCount / 2)];
    const frame = readFrame(run, mid, "V");
    const text = describeIngotFrame(run, frame, findFronts(frame.solidFraction, run.positionM, run.radiusM), "V");
    expect(text).toMatch(/solid shell \d+ mm thick/);
    expect(text).toMatch(/remaining liquid holds .* V/);
    const end = describeIngotResult(run, "V");
    expect(end).toMatch(/fully solid after/);
    expect(end).not.toBe(text);
    // A different element changes the words.
    expect(describeIngotResult(run, "Cr")).not.toBe(end);
  });
});

describe("model choices of the simulation", () => {
  it("maps mixing 1 to a perfectly mixed liquid, 0 to a stagnant one and ½ to the core's default layer", () => {
    expect(boundaryLayerForMixing(1)).toBe(0);
    expect(boundaryLayerForMixing(0)).toBe(Infinity);
    expect(boundaryLayerForMixing(0.5)).toBeCloseTo(REFERENCE_BOUNDARY_LAYER_M, 15);
    expect(() => boundaryLayerForMixing(1.1)).toThrow();
  });

  it("flags MC at 12 % V in the last liquid and a eutectic when C reaches the Cr-lowered eutectic (app rules)", () => {
    expect(coarseCarbideRisk({ V: 11.9 })).toBe("none");
    expect(coarseCarbideRisk({ V: 12 })).toBe("MC");
    expect(eutecticCarbonMassPct(0)).toBe(4.3); // Fe–C eutectic (science-reference §5.2)
    expect(coarseCarbideRisk({ C: 3.0, Cr: 20 })).toBe("eutectic"); // 4.3 − 1.4 = 2.9 ≤ 3.0
    expect(coarseCarbideRisk({ C: 3.0, Cr: 10 })).toBe("none");
    expect(coarseCarbideRisk({ V: 20, C: 5 })).toBe("both");
  });

  it("uses the core's λ2 fit unchanged up to 1 % C and holds its carbon term at 1 % above", () => {
    expect(displayArmSpacingUm(1, 0.5)!.valueUm).toBeCloseTo(secondaryArmSpacingUm(1, 0.5).value, 12);
    const capped = displayArmSpacingUm(1, 2.45)!;
    // Won & Thomas 2001 at CR 1 °C/s, C 1.0: 143.90 µm (science-reference §3.4 check 2).
    expect(capped.valueUm).toBeCloseTo(143.9, 2);
    expect(capped.carbonCapped).toBe(true);
    expect(displayArmSpacingUm(1, 0)).toBeNull();
  });
});
