import {
  chromiumAtomFraction,
  createClusterWorkspace,
  createRandom,
  hasSpanningCluster,
  labelClusters,
  spanningCurve,
} from "../../metallurgy";
import { SLAB_DEPTH_LAYERS } from "./constants";
import type { PassiveFilmParams } from "./params";

export interface SpanningModel {
  lattice: PassiveFilmParams["lattice"];
  neighbours: PassiveFilmParams["neighbours"];
  connectivity: PassiveFilmParams["connectivity"];
}

export interface SpanningPoint {
  crMassPct: number;
  crAtomFraction: number;
  probability: number;
}

export interface SpanningCurveForModel {
  points: SpanningPoint[];
  samples: number;
  /** Lattice the probabilities were computed on, e.g. "32 × 32 × 32" or "64 × 64 × 3". */
  geometry: string;
  warnings: string[];
}

/** Cr mass % grid of the curve: 0–30 % in 1 % steps (the slider's range). */
export const SPANNING_GRID_CR_MASS_PCT: readonly number[] = Array.from({ length: 31 }, (_, i) => i);

/** Cube edge for the bulk curve: 32 is the size of the core's reference checks (science-reference §1a check 4). */
export const BULK_CUBE_EDGE = 32;
/** Lateral edge of the thin-layer slab. */
export const THIN_SLAB_EDGE = 64;

/**
 * Probability that the Cr sites of a random alloy form a cluster spanning the sample, against Cr mass %.
 * Bulk: the core's spanningCurve on a 32³ cube (open faces, spanning along x).
 * Thin layer: a 64 × 64 slab only SLAB_DEPTH_LAYERS["thin-layer"] layers deep, spanning along x, using the
 * core's cluster labelling (the core's spanningCurve takes cubic boxes only). Both use common random numbers,
 * so the curve never decreases with Cr. Seeded and deterministic.
 */
export function spanningCurveForModel(
  model: SpanningModel,
  opts: { samples: number; seed: number; onProgress?: (fractionDone: number) => void },
): SpanningCurveForModel {
  const fractions = SPANNING_GRID_CR_MASS_PCT.map((w) => chromiumAtomFraction(w));
  if (model.connectivity === "bulk") {
    const result = spanningCurve({
      lattice: model.lattice,
      neighbours: model.neighbours,
      size: BULK_CUBE_EDGE,
      samples: opts.samples,
      seed: opts.seed,
      crAtomFractions: fractions,
      onProgress: opts.onProgress,
    });
    return {
      points: result.points.map((p, i) => ({ crMassPct: SPANNING_GRID_CR_MASS_PCT[i], crAtomFraction: p.crAtomFraction, probability: p.probability })),
      samples: result.samples,
      geometry: `${BULK_CUBE_EDGE} × ${BULK_CUBE_EDGE} × ${BULK_CUBE_EDGE}`,
      warnings: result.warnings,
    };
  }
  const depth = SLAB_DEPTH_LAYERS["thin-layer"];
  const size = [THIN_SLAB_EDGE, THIN_SLAB_EDGE, depth] as const;
  const sites = THIN_SLAB_EDGE * THIN_SLAB_EDGE * depth;
  const random = createRandom(opts.seed);
  const draws = new Float64Array(sites);
  const occupancy = new Uint8Array(sites);
  const workspace = createClusterWorkspace(sites);
  const counts = new Array<number>(fractions.length).fill(0);
  const total = opts.samples * fractions.length;
  let done = 0;
  for (let s = 0; s < opts.samples; s++) {
    for (let i = 0; i < sites; i++) draws[i] = random();
    for (let f = 0; f < fractions.length; f++) {
      for (let i = 0; i < sites; i++) occupancy[i] = draws[i] < fractions[f] ? 1 : 0;
      if (hasSpanningCluster(labelClusters(occupancy, { lattice: model.lattice, neighbours: model.neighbours, size }, workspace), 0)) counts[f]++;
      done++;
    }
    opts.onProgress?.(done / total);
  }
  return {
    points: fractions.map((p, f) => ({ crMassPct: SPANNING_GRID_CR_MASS_PCT[f], crAtomFraction: p, probability: counts[f] / opts.samples })),
    samples: opts.samples,
    geometry: `${THIN_SLAB_EDGE} × ${THIN_SLAB_EDGE} × ${depth}`,
    warnings: [],
  };
}
