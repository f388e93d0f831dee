import type { Element } from "../composition";
import { InputError } from "../errors";

/** Primary solid phase the partition coefficient refers to: δ-ferrite or austenite (γ). */
export type PrimaryPhase = "delta" | "gamma";

/** Equilibrium partition coefficients k = C_s/C_L and the liquidus slope of one solute in steel. */
export interface PartitionDatum {
  /** k between δ-ferrite and liquid (dimensionless). */
  readonly kDelta: number;
  /** k between austenite and liquid (dimensionless). */
  readonly kGamma: number;
  /** Liquidus depression, °C per mass %; null where the reference gives none. */
  readonly liquidusSlopeCPerMassPct: number | null;
  /** Provenance tags of science-reference §3.2. */
  readonly source: string;
}

/**
 * Partition coefficients and liquidus slopes of solutes in steel (science-reference §3.2).
 * Tags: [Checked] = Won & Thomas (2001) implementation; [Mem] = from memory, unverified.
 * V is an unverified estimate (check against a CALPHAD calculation before relying on it).
 */
export const PARTITION_DATA: Readonly<Partial<Record<Element, PartitionDatum>>> = Object.freeze({
  C: { kDelta: 0.19, kGamma: 0.34, liquidusSlopeCPerMassPct: 78, source: "[Checked] Won & Thomas 2001 implementation" },
  Si: { kDelta: 0.77, kGamma: 0.52, liquidusSlopeCPerMassPct: 7.6, source: "[Checked] Won & Thomas 2001" },
  Mn: { kDelta: 0.76, kGamma: 0.78, liquidusSlopeCPerMassPct: 4.9, source: "[Checked] Won & Thomas 2001" },
  S: { kDelta: 0.05, kGamma: 0.035, liquidusSlopeCPerMassPct: 30, source: "[Checked] (slope 38 in the Won & Thomas implementation)" },
  P: { kDelta: 0.23, kGamma: 0.13, liquidusSlopeCPerMassPct: 34, source: "k [Mem]; m [Checked]" },
  Cr: { kDelta: 0.95, kGamma: 0.86, liquidusSlopeCPerMassPct: 1.3, source: "k [Mem]; m [Checked]" },
  Mo: { kDelta: 0.8, kGamma: 0.585, liquidusSlopeCPerMassPct: 2, source: "k [Mem]; m [Checked]" },
  Ni: { kDelta: 0.83, kGamma: 0.95, liquidusSlopeCPerMassPct: 3.1, source: "k [Mem] (one public implementation uses 0.81/0.87); m [Checked]" },
  V: { kDelta: 0.9, kGamma: 0.6, liquidusSlopeCPerMassPct: 2, source: "[Mem] not verified; check against CALPHAD before use" },
  N: { kDelta: 0.25, kGamma: 0.48, liquidusSlopeCPerMassPct: null, source: "[Mem]" },
});

/**
 * Equilibrium partition coefficient of an element between the primary solid phase and
 * liquid steel (dimensionless). Throws InputError for elements without data (W, Cu).
 * Source: PARTITION_DATA (science-reference §3.2).
 */
export function partitionCoefficient(element: Element, phase: PrimaryPhase = "gamma"): number {
  const datum = PARTITION_DATA[element];
  if (!datum) {
    const known = Object.keys(PARTITION_DATA).join(", ");
    throw new InputError("element", element, `an element with partition data (${known})`);
  }
  if (phase !== "gamma" && phase !== "delta") throw new InputError("phase", phase, "one of gamma, delta");
  return phase === "gamma" ? datum.kGamma : datum.kDelta;
}
