import { InputError } from "../errors";
import { createRandom, type RandomSource } from "../random";
import { requireInRange, requireInteger, requireOneOf } from "../validate";
import { createClusterWorkspace, hasSpanningCluster, labelClusters, type LatticeGeometry } from "./cluster-labelling";
import { latticeDimension, LATTICE_TYPES, resolveDimensions, type LatticeType } from "./lattice-neighbours";

export interface SpanningOptions {
  lattice: LatticeType;
  neighbours: 1 | 2;
  /**
   * Edge length L of a cube/square: 16–128 in 3-D (warn < 32), 16–2048 in 2-D (warn < 64). Or explicit
   * dimensions, e.g. a thin film [64, 64, 3]: the spanning axis must be ≥ 16 long, the others ≥ 1, and
   * a warning flags every dimension below the finite-size limit.
   */
  size: number | readonly number[];
  /** Cr atom fraction p = probability that a site is Cr (0–1). */
  crAtomFraction: number;
  /** Number of independent random lattices (1–100 000). */
  samples: number;
  /** Seed of the mulberry32 source: the same seed replays the same lattices. */
  seed: number;
  /** Axis along which spanning is tested (0 = x, 1 = y, 2 = z); default 0. */
  axis?: 0 | 1 | 2;
}

export interface SpanningResult {
  /** Fraction of samples with a cluster connecting the two open faces normal to the axis. */
  probability: number;
  spanningSamples: number;
  samples: number;
  warnings: string[];
}

export interface SpanningCurveOptions extends Omit<SpanningOptions, "crAtomFraction"> {
  crAtomFractions: readonly number[];
  /** Called with the fraction of work done (0–1], at most about 100 times plus once at the end. */
  onProgress?: (fractionDone: number) => void;
}

export interface SpanningCurvePoint {
  crAtomFraction: number;
  probability: number;
  spanningSamples: number;
}

export interface SpanningCurveResult {
  points: SpanningCurvePoint[];
  samples: number;
  warnings: string[];
}

const LIMITS = { minSize: 16, warn3D: 32, warn2D: 64, max3D: 128, max2D: 2048, maxSamples: 100_000 } as const;

function validateSpanning(opts: Omit<SpanningOptions, "crAtomFraction">): { warnings: string[]; geometry: LatticeGeometry; sites: number; axis: 0 | 1 | 2 } {
  requireOneOf("lattice", opts.lattice, LATTICE_TYPES);
  requireOneOf("neighbours", opts.neighbours, [1, 2] as const);
  const dim = latticeDimension(opts.lattice);
  const max = dim === 3 ? LIMITS.max3D : LIMITS.max2D;
  const warnBelow = dim === 3 ? LIMITS.warn3D : LIMITS.warn2D;
  requireInteger("samples", opts.samples, { min: 1, max: LIMITS.maxSamples });
  requireInRange("seed", opts.seed, {});
  const axis = requireOneOf("axis", opts.axis ?? 0, dim === 3 ? ([0, 1, 2] as const) : ([0, 1] as const));
  const warnings: string[] = [];
  let dims: number[];
  if (typeof opts.size === "number") {
    requireInteger("size", opts.size, { min: LIMITS.minSize, max });
    dims = Array(dim).fill(opts.size);
  } else {
    dims = [...resolveDimensions(opts.lattice, opts.size)].slice(0, dim);
    dims.forEach((n, i) => requireInteger(`size[${i}]`, n, { min: i === axis ? LIMITS.minSize : 1, max }));
  }
  const small = dims.filter((n) => n < warnBelow);
  if (small.length > 0) {
    warnings.push(
      `A lattice dimension below ${warnBelow} (${dims.join(" × ")}): finite-size effects shift and broaden the apparent threshold` +
        (small.length < dims.length ? "; thin directions raise it (2-D → 3-D crossover)." : "."),
    );
  }
  const sites = dims.reduce((a, b) => a * b, 1);
  return { warnings, geometry: { lattice: opts.lattice, neighbours: opts.neighbours, size: dims }, sites, axis };
}

/** Fills `occupancy` with 1 (Cr) at probability p and 0 (Fe) otherwise; one random draw per site, in index order. */
export function fillRandomOccupancy(occupancy: Uint8Array, p: number, random: RandomSource): Uint8Array {
  requireInRange("p", p, { min: 0, max: 1 });
  for (let i = 0; i < occupancy.length; i++) occupancy[i] = random() < p ? 1 : 0;
  return occupancy;
}

/**
 * Monte-Carlo probability that Cr sites (random, atom fraction p) form a cluster spanning the box between
 * the two open faces normal to one axis. Seeded and deterministic (mulberry32). Science-reference §1a:
 * rejects L < 16, warns L < 32 in 3-D (L < 64 in 2-D, [App] matching the reference's 2-D check size).
 */
export function spanningProbability(opts: SpanningOptions): SpanningResult {
  const { warnings, geometry, sites, axis } = validateSpanning(opts);
  const p = requireInRange("crAtomFraction", opts.crAtomFraction, { min: 0, max: 1 });
  const random = createRandom(opts.seed);
  const occupancy = new Uint8Array(sites);
  const ws = createClusterWorkspace(sites);
  let spanning = 0;
  for (let s = 0; s < opts.samples; s++) {
    fillRandomOccupancy(occupancy, p, random);
    if (hasSpanningCluster(labelClusters(occupancy, geometry, { workspace: ws, labelSites: false }), axis)) spanning++;
  }
  return { probability: spanning / opts.samples, spanningSamples: spanning, samples: opts.samples, warnings };
}

/**
 * Spanning probability at several Cr atom fractions. Every fraction uses the same seeded lattices
 * ("common random numbers": each site keeps its uniform draw u and is Cr when u < p), so each point equals
 * spanningProbability with the same seed, and the curve is exactly non-decreasing in p.
 * `onProgress(fractionDone)` lets a UI (ideally in a worker) show progress.
 */
export function spanningCurve(opts: SpanningCurveOptions): SpanningCurveResult {
  const { warnings, geometry, sites, axis } = validateSpanning(opts);
  if (!Array.isArray(opts.crAtomFractions) || opts.crAtomFractions.length === 0) {
    throw new InputError("crAtomFractions", opts.crAtomFractions, "a non-empty list of Cr atom fractions 0–1");
  }
  opts.crAtomFractions.forEach((p, i) => requireInRange(`crAtomFractions[${i}]`, p, { min: 0, max: 1 }));
  const fractions = opts.crAtomFractions;
  const random = createRandom(opts.seed);
  const draws = new Float64Array(sites);
  const occupancy = new Uint8Array(sites);
  const ws = createClusterWorkspace(sites);
  const counts = new Array<number>(fractions.length).fill(0);
  const total = opts.samples * fractions.length;
  const step = Math.max(1, Math.ceil(total / 100));
  let done = 0;
  for (let s = 0; s < opts.samples; s++) {
    for (let i = 0; i < sites; i++) draws[i] = random();
    for (let f = 0; f < fractions.length; f++) {
      const p = fractions[f];
      for (let i = 0; i < sites; i++) occupancy[i] = draws[i] < p ? 1 : 0;
      if (hasSpanningCluster(labelClusters(occupancy, geometry, { workspace: ws, labelSites: false }), axis)) counts[f]++;
      done++;
      if (opts.onProgress && (done % step === 0 || done === total)) opts.onProgress(done / total);
    }
  }
  return {
    points: fractions.map((p, f) => ({ crAtomFraction: p, probability: counts[f] / opts.samples, spanningSamples: counts[f] })),
    samples: opts.samples,
    warnings,
  };
}
