import { describe, expect, it } from "vitest";
import { PERCOLATION_THRESHOLDS, percolationThreshold } from "@shared/metallurgy/passivity";

const within = (actual: number, expected: number, tol: number) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tol);

describe("PERCOLATION_THRESHOLDS", () => {
  it("holds the site thresholds of science-reference §1a", () => {
    expect(percolationThreshold("sc", 1)?.pc).toBe(0.31160768); // [Checked] Xu et al. 2014
    expect(percolationThreshold("bcc", 1)?.pc).toBe(0.2459615); // [Checked] Xu et al. 2014
    expect(percolationThreshold("fcc", 1)?.pc).toBe(0.19923517); // [Checked] Xu et al. 2014
    expect(percolationThreshold("sc", 2)?.pc).toBe(0.1372); // [Checked] Kurzawski & Malarz 2012
    expect(percolationThreshold("bcc", 2)?.pc).toBe(0.175); // [Mem]; reference MC check 0.176 ± 0.002
    expect(percolationThreshold("square", 1)?.pc).toBe(0.592746); // [Checked]
    expect(percolationThreshold("square", 2)?.pc).toBe(0.407254); // [Mem] matching lattice
    expect(percolationThreshold("triangular", 1)?.pc).toBe(0.5); // [Mem] exact
  });

  it("gives the wt% Cr equivalents of the table", () => {
    // [Computed] science-reference §1a table, "≈ wt% Cr equivalent" column (one decimal)
    const expected: [string, 1 | 2, number][] = [
      ["sc", 1, 29.6], ["bcc", 1, 23.3], ["fcc", 1, 18.8], ["sc", 2, 12.9],
      ["bcc", 2, 16.5], ["square", 1, 57.5], ["square", 2, 39.0], ["triangular", 1, 48.2],
    ];
    for (const [lattice, nb, wt] of expected) within(percolationThreshold(lattice as never, nb)!.crMassPct, wt, 0.05);
  });

  it("tags every row with a provenance tag and a source", () => {
    for (const row of PERCOLATION_THRESHOLDS) {
      expect(["Checked", "Mem", "Computed"]).toContain(row.tag);
      expect(row.source.length).toBeGreaterThan(3);
      expect(row.pc).toBeGreaterThan(0);
      expect(row.pc).toBeLessThan(1);
    }
  });

  it("has no entry for unknown combinations", () => {
    expect(percolationThreshold("fcc", 2)).toBeUndefined();
  });
});
