import { cloneEdge, EDGE, PHASE, resistances, type EdgeState } from "./edge-grid";
import { edgeMetrics } from "./edge-metrics";

/** Leftmost and rightmost solid cell of each row (−1 / size for an empty row). */
function rowExtents(e: EdgeState): { left: Int32Array; right: Int32Array } {
  const n = e.size;
  const left = new Int32Array(n).fill(n);
  const right = new Int32Array(n).fill(-1);
  for (let y = 0; y < n; y++) {
    for (let x = 0; x < n; x++) if (e.phase[x + n * y] !== PHASE.air) { left[y] = x; break; }
    for (let x = n - 1; x >= 0; x--) if (e.phase[x + n * y] !== PHASE.air) { right[y] = x; break; }
  }
  return { left, right };
}

/**
 * Sharpening strokes on a stone of hardness stoneHv, alternating the two bevel faces. Each stroke removes
 * a dose shared by the solid cells within the contact band of the outermost point along the face normal,
 * each losing dose/(n·R) with R its phase's resistance to the stone's abrasive (core wear index): a carbide
 * harder than the abrasive holds the stone off the matrix around it. Works row by row from each side, so
 * a stroke costs about (rows × band) cell visits.
 */
export function sharpenStrokes(e: EdgeState, stoneHv: number, strokes: number): EdgeState {
  const R = resistances(e, stoneHv);
  const band = EDGE.contactBandUm / e.cellUm;
  const half = (EDGE.includedAngleDeg / 2) * (Math.PI / 180);
  const cos = Math.cos(half);
  const sin = Math.sin(half);
  const n = e.size;
  const { left, right } = rowExtents(e);
  const contact: number[] = [];
  for (let s = 0; s < strokes; s++) {
    const fromLeft = e.strokes % 2 === 0;
    // Outward normal of the face: (∓cos, −sin); d = n·p is largest at the outermost point.
    const nx = fromLeft ? -cos : cos;
    const edgeX = fromLeft ? left : right;
    let dmax = -Infinity;
    for (let y = 0; y < n; y++) {
      const x = edgeX[y];
      if (x < 0 || x >= n) continue;
      const d = nx * (x + 0.5) - sin * (y + 0.5);
      if (d > dmax) dmax = d;
    }
    if (dmax === -Infinity) break;
    contact.length = 0;
    for (let y = 0; y < n; y++) {
      const x0 = edgeX[y];
      if (x0 < 0 || x0 >= n) continue;
      const step = fromLeft ? 1 : -1;
      for (let x = x0; x >= 0 && x < n; x += step) {
        const d = nx * (x + 0.5) - sin * (y + 0.5);
        if (d < dmax - band) break;
        if (e.phase[x + n * y] !== PHASE.air) contact.push(x + n * y);
      }
    }
    const share = EDGE.sharpenDoseUm2PerStroke / (e.cellUm * e.cellUm) / contact.length;
    for (const j of contact) {
      e.material[j] -= share / R[e.phase[j]];
      if (e.material[j] > 0) continue;
      e.material[j] = 0;
      e.phase[j] = PHASE.air;
      const y = Math.floor(j / n);
      const x = j - n * y;
      if (x === left[y]) { let k = x; while (k < n && e.phase[k + n * y] === PHASE.air) k++; left[y] = k; }
      if (x === right[y]) { let k = x; while (k >= 0 && e.phase[k + n * y] === PHASE.air) k--; right[y] = k; }
    }
    e.strokes++;
  }
  return e;
}

/** Strokes needed to restore a worn edge on a stone (sharpens a copy; stops at maxStrokes). */
export function strokesToRestore(e: EdgeState, stoneHv: number, maxStrokes = 5000, batch = 10): number | null {
  const copy = cloneEdge(e);
  copy.strokes = 0;
  while (copy.strokes < maxStrokes) {
    sharpenStrokes(copy, stoneHv, batch);
    if (edgeMetrics(copy).sharp) return copy.strokes;
  }
  return null;
}
