import { describe, expect, it } from "vitest";
import { simulateDropletFlight } from "../../../../shared/metallurgy/powder/droplet-flight";
import { dropletCooling } from "../../../../shared/metallurgy/powder/droplet-cooling";
import { InputError } from "../../../../shared/metallurgy/errors";

describe("droplet flight integrator", () => {
  it("is deterministic and goes liquid → undercooled → frozen → cold", () => {
    const a = simulateDropletFlight({ gas: "N2", diameterM: 50e-6, samples: 101, durationS: 1 });
    const b = simulateDropletFlight({ gas: "N2", diameterM: 50e-6, samples: 101, durationS: 1 });
    expect(Array.from(a.tempK)).toEqual(Array.from(b.tempK));
    expect(a.timeS[100]).toBeCloseTo(1, 12);
    expect(a.nucleationTimeS).toBeGreaterThan(0);
    expect(a.solidificationEndTimeS).toBeGreaterThan(a.nucleationTimeS);
    expect(a.tempK[100]).toBeLessThan(301);
    expect(a.solidFraction[100]).toBe(1);
    for (let i = 1; i < 101; i++) {
      expect(a.solidFraction[i]).toBeGreaterThanOrEqual(a.solidFraction[i - 1]);
      expect(a.fallM[i]).toBeGreaterThan(a.fallM[i - 1]);
    }
    expect(a.warnings).toEqual([]);
  });

  it("cools at the Ranz–Marshall rate and freezes in about the isothermal freezing time", () => {
    // Consistency with dropletCooling (science-reference §4.2): the mean liquid cooling rate lies between the
    // still-gas and the initial-slip values; freezing takes (1 − c·ΔT_n/L_f) of t_s, within the speed range.
    const d = 50e-6;
    const f = simulateDropletFlight({ gas: "N2", diameterM: d, emissivity: 0, initialVelocityMPerS: 50, gasVelocityMPerS: 0 });
    const still = dropletCooling({ gas: "N2", diameterM: d, relativeVelocityMPerS: 0, dropletTempK: 1823.15, gasTempK: 300 });
    const fast = dropletCooling({ gas: "N2", diameterM: d, relativeVelocityMPerS: 50, dropletTempK: 1823.15, gasTempK: 300 });
    expect(f.liquidCoolingRateKPerS).toBeGreaterThan(0.8 * still.coolingRateKPerS);
    expect(f.liquidCoolingRateKPerS).toBeLessThan(fast.coolingRateKPerS);
    const freezing = f.solidificationEndTimeS - f.nucleationTimeS;
    const share = 1 - (800 * 50) / 2.7e5;
    expect(freezing).toBeGreaterThan(share * fast.freezeTimeS * 0.9);
    expect(freezing).toBeLessThan(share * still.freezeTimeS * 1.1);
  });

  it("larger droplets freeze later and fall further first", () => {
    const small = simulateDropletFlight({ gas: "Ar", diameterM: 20e-6 });
    const large = simulateDropletFlight({ gas: "Ar", diameterM: 200e-6 });
    expect(large.solidificationEndTimeS).toBeGreaterThan(small.solidificationEndTimeS);
    expect(large.fallM[large.fallM.length - 1]).toBeGreaterThan(small.fallM[small.fallM.length - 1]);
  });

  it("stays fast for micron droplets and warns when the flight is too short", () => {
    const t0 = performance.now();
    const tiny = simulateDropletFlight({ gas: "N2", diameterM: 1e-6, durationS: 5 });
    expect(performance.now() - t0).toBeLessThan(2000);
    expect(tiny.solidificationEndTimeS).toBeGreaterThan(0);
    const short = simulateDropletFlight({ gas: "N2", diameterM: 500e-6, durationS: 0.01 });
    expect(short.warnings.join(" ")).toMatch(/nucleation|freezing/);
  });

  it("rejects invalid parameters", () => {
    expect(() => simulateDropletFlight({ gas: "N2", diameterM: 0 })).toThrow(/diameterM/);
    expect(() => simulateDropletFlight({ gas: "N2", diameterM: 5e-5, samples: 1 })).toThrow(/samples/);
    expect(() => simulateDropletFlight({ gas: "N2", diameterM: 5e-5, nucleationUndercoolingK: -5 })).toThrow(InputError);
  });
});
