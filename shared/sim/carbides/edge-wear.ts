import { ABRASIVES } from "../../metallurgy";
import { columnTops, EDGE, PHASE, resistances, type EdgeState } from "./edge-grid";

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

