import { describe, expect, it } from "vitest";
import { InputError } from "@shared/metallurgy/errors";
import { sampleCarbideField, type CarbideField } from "@shared/metallurgy/carbides";

const within = (actual: number, expected: number, tol: number) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tol);

/** Point counting on a fine grid with periodic wrap: the stereologist's estimate of area fraction per type. */
function pointCount(field: CarbideField, stepUm: number): Record<string, number> {
  const nx = Math.round(field.widthUm / stepUm);
  const ny = Math.round(field.heightUm / stepUm);
  const owner = new Int32Array(nx * ny).fill(-1);
  let overlaps = 0;
  field.particles.forEach((p, k) => {
    const r = Math.ceil(p.radiusUm / stepUm) + 1;
    const cx = Math.floor(p.xUm / stepUm), cy = Math.floor(p.yUm / stepUm);
    for (let i = cx - r; i <= cx + r; i++) {
      for (let j = cy - r; j <= cy + r; j++) {
        const dx = (i + 0.5) * stepUm - p.xUm, dy = (j + 0.5) * stepUm - p.yUm;
        if (dx * dx + dy * dy > p.radiusUm * p.radiusUm) continue;
        const gi = ((i % nx) + nx) % nx, gj = ((j % ny) + ny) % ny;
        if (owner[gi + nx * gj] >= 0) overlaps++;
        owner[gi + nx * gj] = k;
      }
    }
  });
  expect(overlaps).toBe(0); // particles do not overlap
  const counts: Record<string, number> = {};
  for (const o of owner) if (o >= 0) counts[field.particles[o].type] = (counts[field.particles[o].type] ?? 0) + 1;
  for (const t of Object.keys(counts)) counts[t] /= nx * ny;
  return counts;
}

describe("sampleCarbideField", () => {
  it("matches area fraction to volume fraction (stereology, Delesse) for log-normal sizes", () => {
    const field = sampleCarbideField({
      phases: [{ type: "MC", volumeFraction: 0.1, meanRadiusUm: 0.8 }, { type: "M7C3", volumeFraction: 0.15 }],
      widthUm: 120,
      heightUm: 80,
      seed: 42,
      sizeModel: "lognormal",
      meanRadiusUm: 1.5,
    });
    expect(field.warnings).toEqual([]);
    const measured = pointCount(field, 0.1);
    within(measured.MC, 0.1, 0.01); // area fraction = volume fraction within sampling error
    within(measured.M7C3, 0.15, 0.01);
    within(field.areaFractionByType.MC, 0.1, 0.005);
    expect(field.targetAreaFractionByType).toEqual({ MC: 0.1, M7C3: 0.15 });
  });

  it("matches for LSW sizes and several seeds", () => {
    for (const seed of [1, 2, 3]) {
      const field = sampleCarbideField({ phases: [{ type: "M23C6", volumeFraction: 0.2 }], areaUm2: 6400, seed, sizeModel: "lsw", meanRadiusUm: 1 });
      within(pointCount(field, 0.1).M23C6, 0.2, 0.01);
      const radii = field.particles.map((p) => p.radiusUm);
      expect(Math.max(...radii)).toBeLessThan(1.5); // LSW cut-off at 1.5 r̄
      within(radii.reduce((s, r) => s + r, 0) / radii.length, 1, 0.05);
    }
  });

  it("replays exactly from its seed and keeps particles inside the field", () => {
    const opts = { phases: [{ type: "MC", volumeFraction: 0.12 }], widthUm: 50, heightUm: 50, seed: 9, sizeModel: "lognormal" as const, meanRadiusUm: 1 };
    const a = sampleCarbideField(opts);
    expect(sampleCarbideField(opts)).toEqual(a);
    expect(sampleCarbideField({ ...opts, seed: 10 }).particles).not.toEqual(a.particles);
    for (const p of a.particles) {
      expect(p.xUm).toBeGreaterThanOrEqual(0);
      expect(p.xUm).toBeLessThan(50);
      expect(p.radiusUm).toBeGreaterThan(0);
    }
  });

  it("warns when particles are large for the field", () => {
    const f = sampleCarbideField({ phases: [{ type: "MC", volumeFraction: 0.1 }], widthUm: 20, heightUm: 20, seed: 1, sizeModel: "lognormal", meanRadiusUm: 2 });
    expect(f.warnings.join(" ")).toMatch(/large for the field/);
  });

  it("rejects bad input with InputError", () => {
    const base = { phases: [{ type: "MC", volumeFraction: 0.1 }], widthUm: 50, heightUm: 50, seed: 1, sizeModel: "lognormal" as const, meanRadiusUm: 1 };
    expect(() => sampleCarbideField({ ...base, phases: [{ type: "MC", volumeFraction: 0.7 }] })).toThrow(InputError);
    expect(() => sampleCarbideField({ ...base, phases: [{ type: "MC", volumeFraction: -0.1 }] })).toThrow(InputError);
    expect(() => sampleCarbideField({ ...base, meanRadiusUm: 0 })).toThrow(InputError);
    expect(() => sampleCarbideField({ ...base, meanRadiusUm: 0.01 })).toThrow(InputError); // too many particles
    expect(() => sampleCarbideField({ ...base, widthUm: Number.NaN })).toThrow(InputError);
    expect(() => sampleCarbideField({ ...base, sizeModel: "gamma" as never })).toThrow(InputError);
    expect(() => sampleCarbideField({ ...base, geometricStdDev: 0.5 })).toThrow(InputError);
  });
});
