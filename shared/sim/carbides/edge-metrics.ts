import { columnTops, EDGE, PHASE, type EdgeState } from "./edge-grid";

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

