import { CARBIDE_DATA, wearIndex, type CarbideType } from "../../metallurgy";
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

/** Resistance of every phase of the edge to an abrasive of hardness abrasiveHv (index = phase id). */
export function resistances(e: EdgeState, abrasiveHv: number): Float64Array {
  const r = new Float64Array(e.phaseHv.length);
  for (let p = 1; p < r.length; p++) r[p] = phaseResistance(e.phaseHv[p], abrasiveHv);
  return r;
}

/** Top solid row of each column (size = empty column). */
export function columnTops(e: EdgeState): Int32Array {
  const tops = new Int32Array(e.size).fill(e.size);
  for (let x = 0; x < e.size; x++) {
    for (let y = 0; y < e.size; y++) if (e.phase[x + e.size * y] !== PHASE.air) { tops[x] = y; break; }
  }
  return tops;
}

