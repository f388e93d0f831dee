import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { neumannLambda, neumannShellThicknessM, stefanNumber } from "../../../../shared/metallurgy/solidification/neumann";
import { erf } from "../../../../shared/metallurgy/solidification/erf";
import { InputError } from "../../../../shared/metallurgy/errors";

describe("Neumann (one-phase Stefan) solution", () => {
  it("λ matches the check values", () => {
    // [Computed] science-reference §3.6 check 1: St 0.1 / 0.5 / 1.0 / 2.0 → 0.220016 / 0.464786 / 0.620063 / 0.800601, ±1e-5
    const cases: [number, number][] = [
      [0.1, 0.220016],
      [0.5, 0.464786],
      [1.0, 0.620063],
      [2.0, 0.800601],
    ];
    for (const [st, lambda] of cases) expect(Math.abs(neumannLambda(st) - lambda)).toBeLessThan(1e-5);
  });

  it("solves the transcendental equation to round-off over a wide St range (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1e4, noNaN: true }), (st) => {
        const l = neumannLambda(st);
        const lhs = l * Math.exp(l * l) * erf(l);
        expect(Math.abs(lhs - st / Math.sqrt(Math.PI)) / (st / Math.sqrt(Math.PI))).toBeLessThan(1e-12);
      }),
    );
  });

  it("computes the Stefan number and the shell thickness", () => {
    // St = c(T_m − T_w)/L_f, s = 2λ√(αt) — science-reference §3.6 oracle (b)
    expect(stefanNumber(680, 1500, 1000, 2.7e5)).toBeCloseTo(680 * 500 / 2.7e5, 14);
    expect(neumannShellThicknessM(0.5, 4e-6, 100)).toBeCloseTo(2 * 0.5 * 0.02, 14);
  });

  it("rejects St ≤ 0 and a wall at or above the melting point", () => {
    expect(() => neumannLambda(0)).toThrow(InputError);
    expect(() => neumannLambda(-1)).toThrow(/stefanNumber/);
    expect(() => stefanNumber(680, 1500, 1500, 2.7e5)).toThrow(/wallTempC/);
  });
});
