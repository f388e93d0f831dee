/**
 * Reading the recorded ingot frames at any model time (linear interpolation between the two
 * nearest frames), and the positions of the solidus and liquidus fronts. Pure; the canvas
 * calls these every animation frame with reused output buffers, so nothing is allocated.
 */
import type { IngotElement } from "./params";
import type { IngotRun } from "./run";

export interface IngotFrameView {
  timeS: number;
  tempC: Float32Array;
  solidFraction: Float32Array;
  /** Node mean composition of the chosen element, mass % (null if the element is not in the alloy). */
  meanMassPct: Float32Array | null;
  /** Composition of the remaining liquid pool, mass % (null as above). */
  poolMassPct: number | null;
}

export function createFrameView(cells: number): IngotFrameView {
  return { timeS: 0, tempC: new Float32Array(cells), solidFraction: new Float32Array(cells), meanMassPct: new Float32Array(cells), poolMassPct: null };
}

/** Index of the last frame with time ≤ t (binary search). */
export function frameIndexAt(frameTimeS: Float64Array, count: number, timeS: number): number {
  if (count === 0 || timeS <= frameTimeS[0]) return 0;
  if (timeS >= frameTimeS[count - 1]) return count - 1;
  let lo = 0;
  let hi = count - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (frameTimeS[mid] <= timeS) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Fills `out` with the state at `timeS` (clamped to the run) and returns it. */
export function readFrame(run: IngotRun, timeS: number, element: IngotElement, out: IngotFrameView = createFrameView(run.cells)): IngotFrameView {
  const n = run.cells;
  const count = run.frameCount;
  const t = Math.min(Math.max(timeS, 0), run.frameTimeS[count - 1] ?? 0);
  const a = frameIndexAt(run.frameTimeS, count, t);
  const b = Math.min(a + 1, count - 1);
  const span = run.frameTimeS[b] - run.frameTimeS[a];
  const w = span > 0 ? (t - run.frameTimeS[a]) / span : 0;
  const lerpRow = (src: Float32Array, dst: Float32Array) => {
    const ra = a * n;
    const rb = b * n;
    for (let i = 0; i < n; i++) dst[i] = src[ra + i] + w * (src[rb + i] - src[ra + i]);
  };
  out.timeS = t;
  lerpRow(run.frameTempC, out.tempC);
  lerpRow(run.frameSolidFraction, out.solidFraction);
  const means = run.frameMeanMassPct[element];
  const pool = run.framePoolMassPct[element];
  if (means && pool) {
    if (!out.meanMassPct || out.meanMassPct.length !== n) out.meanMassPct = new Float32Array(n);
    lerpRow(means, out.meanMassPct);
    out.poolMassPct = pool[a] + w * (pool[b] - pool[a]);
  } else {
    out.meanMassPct = null;
    out.poolMassPct = null;
  }
  return out;
}

export interface Fronts {
  /** Distance from the wall to where the section stops being fully solid, m. */
  solidusFrontM: number;
  /** Distance from the wall to where the liquid (no solid at all) begins, m. */
  liquidusFrontM: number;
  /** Solid fraction of the whole round section (area-weighted), 0–1. */
  sectionSolidFraction: number;
}

/** Front positions by linear interpolation of the solid fraction between nodes. */
export function findFronts(solidFraction: ArrayLike<number>, positionM: ArrayLike<number>, radiusM: number): Fronts {
  const n = solidFraction.length;
  const crossing = (threshold: number, above: boolean) => {
    for (let i = 0; i < n; i++) {
      const f = solidFraction[i];
      const past = above ? f < threshold : f <= threshold;
      if (past) {
        if (i === 0) return 0;
        const f0 = solidFraction[i - 1];
        const w = f0 === f ? 0 : (f0 - threshold) / (f0 - f);
        return positionM[i - 1] + Math.min(1, Math.max(0, w)) * (positionM[i] - positionM[i - 1]);
      }
    }
    return radiusM;
  };
  // Area weights of a round section: ring at radius r = R − x has weight ∝ r.
  let weighted = 0;
  let total = 0;
  for (let i = 0; i < n; i++) {
    const r = Math.max(radiusM - positionM[i], (positionM[1] - positionM[0]) / 4);
    weighted += r * solidFraction[i];
    total += r;
  }
  return {
    solidusFrontM: crossing(1 - 1e-6, true),
    liquidusFrontM: crossing(1e-6, false),
    sectionSolidFraction: total > 0 ? weighted / total : 0,
  };
}
