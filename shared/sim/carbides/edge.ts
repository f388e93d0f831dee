import { ABRASIVES, CARBIDE_DATA, wearIndex, type CarbideType } from "../../metallurgy";
import type { BaseField, VisibleField } from "./field";

/**
 * Edge model constants. [App] choices of this simulation (no source): a 40° included edge angle (common
 * practice for knives is about 30–40°, [Trade]), a 0.125 µm grid, and abrasion doses tuned for the animation.
 */
export const EDGE = {
  windowUm: 20,
  cellUm: 0.125,
  includedAngleDeg: 40,
  /** Apex this far below the top of the window, µm. */
  apexDepthUm: 2.5,
  /** Depth below the outermost point that an abrasive grain reaches (≈ grain size), µm. */
  contactBandUm: 1,
  /** Material removed per cutting cycle, µm² of section, shared by the cells in contact. */
  wearDoseUm2PerCycle: 0.075,
  /** Material removed per sharpening stroke, µm² of section. */
  sharpenDoseUm2PerStroke: 0.5,
  /** Bluntness is measured as the edge width this far below its tip, µm. */
  probeDepthUm: 3,
  /** The edge counts as restored when that width is at most a sharp wedge's plus this margin, µm. */
  sharpMarginUm: 1,
} as const;

export const PHASE = { air: 0, matrix: 1 } as const;

export interface EdgeState {
  /** Cells per side (square grid); row 0 at the top, the apex points up. */
  size: number;
  cellUm: number;
  /** 0 air, 1 matrix, 2 + k carbide of type types[k]. */
  phase: Uint8Array;
  /** Remaining material per cell (1 = intact). */
  material: Float32Array;
  types: CarbideType[];
  /** Hardness (HV) per phase id. */
  phaseHv: Float64Array;
  cycles: number;
  strokes: number;
  /** Row of the sharp apex before any wear. */
  apexRow0: number;
}

/** Abrasion resistance of a single phase against an abrasive: the core's wear index of that phase alone. */
export function phaseResistance(hardnessHv: number, abrasiveHv: number): number {
  return wearIndex([{ volumeFraction: 1, hardnessHv }], abrasiveHv);
}

/**
 * Cross-section of a sharp edge cut from the middle of the carbide field: a wedge whose cells are matrix
 * or carbide (the visible particles, rasterised on a 0.125 µm grid).
 */
export function createEdge(base: BaseField, visible: VisibleField, matrixHv: number): EdgeState {
  const windowUm = Math.min(EDGE.windowUm, base.widthUm, base.heightUm);
  const size = Math.round(windowUm / EDGE.cellUm);
  const cell = windowUm / size;
  const phase = new Uint8Array(size * size);
  const material = new Float32Array(size * size);
  const apexRow0 = Math.round(EDGE.apexDepthUm / cell);
  const tanHalf = Math.tan((EDGE.includedAngleDeg / 2) * (Math.PI / 180));
  const cx = size / 2;
  for (let y = 0; y < size; y++) {
    for (let x = 0; x < size; x++) {
      const depth = y + 0.5 - apexRow0;
      if (depth >= 0 && Math.abs(x + 0.5 - cx) <= depth * tanHalf + 0.5) {
        phase[x + size * y] = PHASE.matrix;
        material[x + size * y] = 1;
      }
    }
  }
  // Rasterise the visible particles inside the window (with periodic copies).
  const x0 = (base.widthUm - windowUm) / 2;
  const y0 = (base.heightUm - windowUm) / 2;
  for (let k = 0; k < visible.count; k++) {
    const i = visible.index[k];
    const r = visible.radiusUm[k];
    for (const ox of [-base.widthUm, 0, base.widthUm]) {
      for (const oy of [-base.heightUm, 0, base.heightUm]) {
        const px = base.xUm[i] + ox - x0;
        const py = base.yUm[i] + oy - y0;
        if (px + r < 0 || py + r < 0 || px - r > windowUm || py - r > windowUm) continue;
        const id = 2 + base.typeIndex[i];
        for (let y = Math.max(0, Math.floor((py - r) / cell)); y <= Math.min(size - 1, Math.floor((py + r) / cell)); y++) {
          for (let x = Math.max(0, Math.floor((px - r) / cell)); x <= Math.min(size - 1, Math.floor((px + r) / cell)); x++) {
            const j = x + size * y;
            if (phase[j] === PHASE.air) continue;
            const dx = (x + 0.5) * cell - px;
            const dy = (y + 0.5) * cell - py;
            if (dx * dx + dy * dy <= r * r) phase[j] = id;
          }
        }
      }
    }
  }
  const phaseHv = new Float64Array(2 + base.types.length);
  phaseHv[PHASE.matrix] = matrixHv;
  base.types.forEach((t, k) => { phaseHv[2 + k] = CARBIDE_DATA[t].typicalHv; });
  return { size, cellUm: cell, phase, material, types: base.types, phaseHv, cycles: 0, strokes: 0, apexRow0 };
}

export function cloneEdge(e: EdgeState): EdgeState {
  return { ...e, phase: e.phase.slice(), material: e.material.slice(), phaseHv: e.phaseHv.slice(), types: [...e.types] };
}

function resistances(e: EdgeState, abrasiveHv: number): Float64Array {
  const r = new Float64Array(e.phaseHv.length);
  for (let p = 1; p < r.length; p++) r[p] = phaseResistance(e.phaseHv[p], abrasiveHv);
  return r;
}

/** Top solid row of each column (size = empty column). */
function columnTops(e: EdgeState): Int32Array {
  const tops = new Int32Array(e.size).fill(e.size);
  for (let x = 0; x < e.size; x++) {
    for (let y = 0; y < e.size; y++) if (e.phase[x + e.size * y] !== PHASE.air) { tops[x] = y; break; }
  }
  return tops;
}

/**
 * Cutting cycles against quartz-loaded stock: a flat counter-face presses on the edge from above and
 * abrasive grains reach `contactBandUm` below the highest point. Each cycle removes a fixed dose of
 * material, shared by the columns in contact in proportion to how deep the counter-face presses into them;
 * each top cell loses its share divided by R, its phase's resistance to quartz (core wear index).
 * Soft matrix recedes; hard carbides stand proud.
 */
export function wearCycles(e: EdgeState, cycles: number, abrasiveHv = ABRASIVES.quartz.typicalHv): EdgeState {
  const R = resistances(e, abrasiveHv);
  const band = Math.max(1, Math.round(EDGE.contactBandUm / e.cellUm));
  const tops = columnTops(e);
  const contact: number[] = [];
  for (let c = 0; c < cycles; c++) {
    let top = e.size;
    for (let x = 0; x < e.size; x++) if (tops[x] < top) top = tops[x];
    if (top >= e.size) break;
    contact.length = 0;
    let weightSum = 0;
    for (let x = 0; x < e.size; x++) {
      if (tops[x] > top + band) continue;
      contact.push(x);
      weightSum += top + band + 1 - tops[x];
    }
    // Load shared like an elastic foundation: the deeper the counter-face presses into a column, the more it takes.
    const dose = EDGE.wearDoseUm2PerCycle / (e.cellUm * e.cellUm);
    for (const x of contact) {
      let remove = (dose * (top + band + 1 - tops[x])) / weightSum;
      // A removed cell passes the rest of its share to the cell below it.
      while (remove > 0 && tops[x] < e.size) {
        const j = x + e.size * tops[x];
        const loss = remove / R[e.phase[j]];
        if (loss < e.material[j]) { e.material[j] -= loss; remove = 0; }
        else {
          remove -= e.material[j] * R[e.phase[j]];
          e.material[j] = 0;
          e.phase[j] = PHASE.air;
          let y = tops[x] + 1;
          while (y < e.size && e.phase[x + e.size * y] === PHASE.air) y++;
          tops[x] = y;
        }
      }
    }
    e.cycles++;
  }
  return e;
}

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

export interface EdgeMetrics {
  /** How far the tip has receded from the original apex, µm. */
  apexRecessionUm: number;
  /** Width of the edge 3 µm below its tip, µm (the bluntness; a sharp 40° edge: 2.2 µm). */
  tipWidthUm: number;
  /** Mean height of carbide-topped above matrix-topped columns across the worn flat, µm (> 0: carbides stand proud). */
  carbideProtrusionUm: number;
  /** True when the tip is as narrow as a freshly sharpened edge. */
  sharp: boolean;
}

/** Width of a freshly sharpened edge at the probe depth, plus the margin, µm. */
export function sharpWidthUm(): number {
  return 2 * EDGE.probeDepthUm * Math.tan((EDGE.includedAngleDeg / 2) * (Math.PI / 180)) + EDGE.sharpMarginUm;
}

export function edgeMetrics(e: EdgeState): EdgeMetrics {
  const tops = columnTops(e);
  let top = e.size;
  for (let x = 0; x < e.size; x++) if (tops[x] < top) top = tops[x];
  const probe = Math.min(e.size - 1, top + Math.round(EDGE.probeDepthUm / e.cellUm));
  let width = 0;
  for (let x = 0; x < e.size; x++) if (e.phase[x + e.size * probe] !== PHASE.air) width++;
  // Protrusion across the worn flat (columns within two contact bands of the highest point):
  // mean height of carbide-topped columns above matrix-topped ones.
  const band = Math.max(1, Math.round(EDGE.contactBandUm / e.cellUm));
  let first = e.size, last = -1;
  for (let x = 0; x < e.size; x++) if (tops[x] <= top + 2 * band) { first = Math.min(first, x); last = x; }
  let carbideSum = 0, carbideN = 0, matrixSum = 0, matrixN = 0;
  for (let x = first; x <= last; x++) {
    if (tops[x] >= e.size) continue;
    const ph = e.phase[x + e.size * tops[x]];
    if (ph >= 2) { carbideSum += tops[x]; carbideN++; } else if (ph === PHASE.matrix) { matrixSum += tops[x]; matrixN++; }
  }
  const protrusion = carbideN > 0 && matrixN > 0 ? (matrixSum / matrixN - carbideSum / carbideN) * e.cellUm : 0;
  const widthUm = width * e.cellUm;
  return {
    apexRecessionUm: Math.max(0, top - e.apexRow0) * e.cellUm,
    tipWidthUm: widthUm,
    carbideProtrusionUm: protrusion,
    sharp: widthUm <= sharpWidthUm(),
  };
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
