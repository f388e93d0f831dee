import { describe, expect, it } from "vitest";
import { PARTITION_DATA, partitionCoefficient } from "../../../../shared/metallurgy/solidification/partition-data";
import { InputError } from "../../../../shared/metallurgy/errors";

describe("partition coefficients and liquidus slopes", () => {
  it("holds the table of science-reference §3.2", () => {
    // [Checked] Won & Thomas (2001) implementation: C 0.19/0.34/78, Si 0.77/0.52/7.6, Mn 0.76/0.78/4.9, S 0.05/0.035/30
    expect(PARTITION_DATA.C).toMatchObject({ kDelta: 0.19, kGamma: 0.34, liquidusSlopeCPerMassPct: 78 });
    expect(PARTITION_DATA.Si).toMatchObject({ kDelta: 0.77, kGamma: 0.52, liquidusSlopeCPerMassPct: 7.6 });
    expect(PARTITION_DATA.Mn).toMatchObject({ kDelta: 0.76, kGamma: 0.78, liquidusSlopeCPerMassPct: 4.9 });
    expect(PARTITION_DATA.S).toMatchObject({ kDelta: 0.05, kGamma: 0.035, liquidusSlopeCPerMassPct: 30 });
    // k [Mem], m [Checked]: P 0.23/0.13/34, Cr 0.95/0.86/1.3, Mo 0.80/0.585/2, Ni 0.83/0.95/3.1
    expect(PARTITION_DATA.P).toMatchObject({ kDelta: 0.23, kGamma: 0.13, liquidusSlopeCPerMassPct: 34 });
    expect(PARTITION_DATA.Cr).toMatchObject({ kDelta: 0.95, kGamma: 0.86, liquidusSlopeCPerMassPct: 1.3 });
    expect(PARTITION_DATA.Mo).toMatchObject({ kDelta: 0.8, kGamma: 0.585, liquidusSlopeCPerMassPct: 2 });
    expect(PARTITION_DATA.Ni).toMatchObject({ kDelta: 0.83, kGamma: 0.95, liquidusSlopeCPerMassPct: 3.1 });
    // [Mem] unverified: V ≈0.9/≈0.6/≈2; N 0.25/0.48/—
    expect(PARTITION_DATA.V).toMatchObject({ kDelta: 0.9, kGamma: 0.6, liquidusSlopeCPerMassPct: 2 });
    expect(PARTITION_DATA.N).toMatchObject({ kDelta: 0.25, kGamma: 0.48, liquidusSlopeCPerMassPct: null });
    for (const datum of Object.values(PARTITION_DATA)) {
      expect(datum!.kDelta).toBeGreaterThan(0);
      expect(datum!.kGamma).toBeLessThan(1);
      expect(datum!.source).toMatch(/Checked|Mem/);
    }
  });

  it("selects the phase and rejects elements without data", () => {
    expect(partitionCoefficient("C")).toBe(0.34);
    expect(partitionCoefficient("C", "delta")).toBe(0.19);
    expect(() => partitionCoefficient("W")).toThrow(InputError);
    expect(() => partitionCoefficient("Cu")).toThrow(/partition data/);
  });
});
