import { SCRATCH_RADIUS_SITES } from "./constants";
import { STATUS, type PassiveFilmState } from "./state";
import { decrement, increment, markLive } from "./step";

export interface SitePoint {
  /** Surface-site coordinates (0 … size); fractional values are fine. */
  x: number;
  y: number;
}

/**
 * Cuts a scratch along the segment a→b: film and rust within `radiusSites` are removed and the metal is
 * bare again (bare since now). Carbides are harder than the tool's effect here and stay. The alloy beneath,
 * and so its Cr network, is unchanged. Appends the cut sites to `state.changed`. Returns the number cut.
 */
export function scratch(state: PassiveFilmState, a: SitePoint, b: SitePoint, radiusSites = SCRATCH_RADIUS_SITES): number {
  const L = state.sizeSites;
  const minX = Math.max(0, Math.floor(Math.min(a.x, b.x) - radiusSites));
  const maxX = Math.min(L - 1, Math.ceil(Math.max(a.x, b.x) + radiusSites));
  const minY = Math.max(0, Math.floor(Math.min(a.y, b.y) - radiusSites));
  const maxY = Math.min(L - 1, Math.ceil(Math.max(a.y, b.y) + radiusSites));
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const len2 = dx * dx + dy * dy;
  let cut = 0;
  for (let y = minY; y <= maxY; y++) {
    for (let x = minX; x <= maxX; x++) {
      const px = x + 0.5;
      const py = y + 0.5;
      const t = len2 > 0 ? Math.max(0, Math.min(1, ((px - a.x) * dx + (py - a.y) * dy) / len2)) : 0;
      const d = Math.hypot(px - (a.x + t * dx), py - (a.y + t * dy));
      if (d > radiusSites) continue;
      const i = x + L * y;
      if (state.status[i] === STATUS.carbide) continue;
      if (!state.scratchMask[i]) { state.scratchMask[i] = 1; state.scratchSites++; }
      if (state.status[i] !== STATUS.bare) {
        decrement(state.counts, state.status[i]);
        increment(state.counts, STATUS.bare);
        state.status[i] = STATUS.bare;
      }
      state.sinceS[i] = state.timeS;
      markLive(state, i);
      if (state.changedCount < state.changed.length) state.changed[state.changedCount++] = i;
      cut++;
    }
  }
  return cut;
}

/** Status counts inside all scratches made so far. */
export function scratchCounts(state: PassiveFilmState): { bare: number; film: number; rust: number; total: number } {
  let bare = 0, film = 0, rust = 0;
  for (let i = 0; i < state.scratchMask.length; i++) {
    if (!state.scratchMask[i]) continue;
    const st = state.status[i];
    if (st === STATUS.bare) bare++;
    else if (st === STATUS.film) film++;
    else if (st === STATUS.rust) rust++;
  }
  return { bare, film, rust, total: bare + film + rust };
}
