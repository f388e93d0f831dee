import { chromiumMassPctFromAtomFraction } from "./chromium-atom-fraction";

export type ThresholdLattice = "sc" | "bcc" | "fcc" | "square" | "triangular";

export interface PercolationThreshold {
  lattice: ThresholdLattice;
  /** 1 = nearest neighbours only; 2 = nearest + second-nearest shells. */
  neighbours: 1 | 2;
  dimension: 2 | 3;
  /** Coordination number z (number of connected neighbours). */
  coordination: number;
  /** Site-percolation threshold p_c (atom fraction). */
  pc: number;
  /** Binary Fe–Cr mass % of Cr with atom fraction p_c [Computed]. */
  crMassPct: number;
  /** Provenance tag of science-reference §0. */
  tag: "Checked" | "Mem" | "Computed";
  source: string;
}

function row(lattice: ThresholdLattice, neighbours: 1 | 2, dimension: 2 | 3, coordination: number, pc: number, tag: PercolationThreshold["tag"], source: string): PercolationThreshold {
  return { lattice, neighbours, dimension, coordination, pc, crMassPct: chromiumMassPctFromAtomFraction(pc), tag, source };
}

/**
 * Site-percolation thresholds for the lattices of the passive-film model (science-reference §1a table),
 * with the equivalent binary Fe–Cr wt% Cr. Which neighbour shells are "right" for passivity is not settled:
 * bcc NN+2NN (≈16.5 wt%) and sc NN+2NN (≈12.9 wt%) are competing model choices, not facts.
 */
export const PERCOLATION_THRESHOLDS: readonly PercolationThreshold[] = [
  row("sc", 1, 3, 6, 0.31160768, "Checked", "Xu, Wang, Lv, Deng (2014), Front. Phys. 9, 113 (table citing it)"),
  row("bcc", 1, 3, 8, 0.2459615, "Checked", "Xu, Wang, Lv, Deng (2014), Front. Phys. 9, 113"),
  row("fcc", 1, 3, 12, 0.19923517, "Checked", "Xu, Wang, Lv, Deng (2014), Front. Phys. 9, 113"),
  row("sc", 2, 3, 18, 0.1372, "Checked", "Kurzawski & Malarz (2012), Rep. Math. Phys. 70, 163 (abstract)"),
  row("bcc", 2, 3, 14, 0.175, "Mem", "from memory; reference Monte-Carlo check (L = 64) gave 0.176 ± 0.002 [Computed]"),
  row("square", 1, 2, 4, 0.592746, "Checked", "square-lattice site threshold, science-reference §1a"),
  row("square", 2, 2, 8, 0.407254, "Mem", "= 1 − 0.592746 (matching lattice), science-reference §1a"),
  row("triangular", 1, 2, 6, 0.5, "Mem", "exact (self-matching lattice), science-reference §1a"),
  row("triangular", 2, 2, 12, 0.2902, "Mem", "from memory (not in science-reference); treat as approximate"),
];

/** Looks up p_c for a lattice and neighbour shells; undefined when the table has no entry. */
export function percolationThreshold(lattice: ThresholdLattice, neighbours: 1 | 2): PercolationThreshold | undefined {
  return PERCOLATION_THRESHOLDS.find((t) => t.lattice === lattice && t.neighbours === neighbours);
}
