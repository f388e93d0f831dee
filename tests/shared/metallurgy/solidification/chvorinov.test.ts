import { describe, expect, it } from "vitest";
import { chvorinovTimeMin } from "../../../../shared/metallurgy/solidification/chvorinov";
import { InputError } from "../../../../shared/metallurgy/errors";

describe("Chvorinov's rule", () => {
  it("compares shapes of equal volume", () => {
    // [Computed] science-reference §3.6 check 5 (Chvorinov 1940 [Checked]): t_cube/t_sphere 0.6496; t_cyl(h = d)/t_sphere 0.7631, ±1e-4
    const volume = 1000;
    const cubeArea = 6 * Math.pow(volume, 2 / 3);
    const r = Math.cbrt((3 * volume) / (4 * Math.PI));
    const sphereArea = 4 * Math.PI * r * r;
    const rc = Math.cbrt(volume / (2 * Math.PI)); // h = 2r
    const cylArea = 2 * Math.PI * rc * rc + 2 * Math.PI * rc * 2 * rc;
    const t = (area: number) => chvorinovTimeMin({ volumeCm3: volume, areaCm2: area, mouldConstantMinPerCm2: 2, exponent: 2 }).value;
    expect(Math.abs(t(cubeArea) / t(sphereArea) - 0.6496)).toBeLessThan(1e-4);
    expect(Math.abs(t(cylArea) / t(sphereArea) - 0.7631)).toBeLessThan(1e-4);
  });

  it("gives the solidification times of the examples", () => {
    // [Computed] §3.6 check 6: B 2 min/cm², n 2: 10 cm cube 5.556 min; 200×200×800 mm block (M 4.444 cm) 39.51 min, ±0.01
    expect(Math.abs(chvorinovTimeMin({ volumeCm3: 1000, areaCm2: 600, mouldConstantMinPerCm2: 2, exponent: 2 }).value - 5.556)).toBeLessThan(0.01);
    const block = chvorinovTimeMin({ volumeCm3: 20 * 20 * 80, areaCm2: 2 * 20 * 20 + 4 * 20 * 80 });
    expect(Math.abs(block.value - 39.51)).toBeLessThan(0.01);
    expect(block.warnings).toEqual([]);
  });

  it("warns for n outside 1.5–2 and rejects non-positive inputs", () => {
    expect(chvorinovTimeMin({ volumeCm3: 1000, areaCm2: 600, exponent: 1.2 }).warnings.join(" ")).toMatch(/1.5–2/);
    expect(() => chvorinovTimeMin({ volumeCm3: 0, areaCm2: 600 })).toThrow(InputError);
    expect(() => chvorinovTimeMin({ volumeCm3: 10, areaCm2: -1 })).toThrow(/areaCm2/);
    expect(() => chvorinovTimeMin({ volumeCm3: 10, areaCm2: 6, mouldConstantMinPerCm2: 0 })).toThrow(/mouldConstant/);
  });
});
