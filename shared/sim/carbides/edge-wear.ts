import { ABRASIVES } from "../../metallurgy";
import { EDGE, PHASE, resistances, type EdgeState } from "./edge-grid";

/**
 * Cutting cycles against quartz-loaded stock: a flat counter-face presses on the edge from above and
 * abrasive grains reach `contactBandUm` below the highest point, into the gaps between high spots. Each
 * cycle removes a fixed dose of material, shared by the exposed cells in that band (air above or beside
 * them) in proportion to how deep the counter-face presses there; each cell loses its share divided by R,
 * its phase's resistance to quartz (core wear index). Soft matrix recedes; hard carbides stand proud.
 * Fragments no longer joined to the blade (a carbide whose support has worn away) fall out.
 */
export function wearCycles(e: EdgeState, cycles: number, abrasiveHv = ABRASIVES.quartz.typicalHv): EdgeState {
  const R = resistances(e, abrasiveHv);
  const n = e.size;
  const band = Math.max(1, Math.round(EDGE.contactBandUm / e.cellUm));
  const dose = EDGE.wearDoseUm2PerCycle / (e.cellUm * e.cellUm);
  const cells: number[] = [];
  const weights: number[] = [];
  let top = firstSolidRow(e, 0);
  for (let c = 0; c < cycles && top < n; c++) {
    cells.length = 0;
    weights.length = 0;
    let weightSum = 0;
    const last = Math.min(n - 1, top + band);
    for (let y = top; y <= last; y++) {
      for (let x = 0; x < n; x++) {
        const j = x + n * y;
        if (e.phase[j] === PHASE.air) continue;
        const exposed = y === 0 || e.phase[j - n] === PHASE.air || (x > 0 && e.phase[j - 1] === PHASE.air) || (x < n - 1 && e.phase[j + 1] === PHASE.air);
        if (!exposed) continue;
        const w = top + band + 1 - y;
        cells.push(j);
        weights.push(w);
        weightSum += w;
      }
    }
    for (let k = 0; k < cells.length; k++) {
      const j = cells[k];
      e.material[j] -= (dose * weights[k]) / weightSum / R[e.phase[j]];
      if (e.material[j] <= 0) { e.material[j] = 0; e.phase[j] = PHASE.air; }
    }
    if (c % 5 === 4 || c === cycles - 1) dropDetached(e, top, Math.min(n - 1, top + 3 * band));
    top = firstSolidRow(e, top);
    e.cycles++;
  }
  return e;
}

/** First row at or below `from` that holds a solid cell (size if none). */
function firstSolidRow(e: EdgeState, from: number): number {
  for (let j = from * e.size; j < e.phase.length; j++) if (e.phase[j] !== PHASE.air) return Math.floor(j / e.size);
  return e.size;
}

const queue: number[] = [];
let seen = new Uint8Array(0);

/**
 * Removes solid cells in rows top…bottom that are not joined (4-neighbour) to the solid cells of row
 * `bottom`, taken as attached to the blade.
 */
function dropDetached(e: EdgeState, top: number, bottom: number): void {
  const n = e.size;
  if (seen.length < n * n) seen = new Uint8Array(n * n);
  const from = top * n, to = (bottom + 1) * n;
  seen.fill(0, from, to);
  queue.length = 0;
  for (let j = bottom * n; j < to; j++) if (e.phase[j] !== PHASE.air) { seen[j] = 1; queue.push(j); }
  while (queue.length > 0) {
    const j = queue.pop()!;
    const x = j % n;
    const next = [j - n, x > 0 ? j - 1 : -1, x < n - 1 ? j + 1 : -1, j + n];
    for (const k of next) {
      if (k < from || k >= to || seen[k] || e.phase[k] === PHASE.air) continue;
      seen[k] = 1;
      queue.push(k);
    }
  }
  for (let j = from; j < to; j++) if (e.phase[j] !== PHASE.air && !seen[j]) { e.phase[j] = PHASE.air; e.material[j] = 0; }
}
