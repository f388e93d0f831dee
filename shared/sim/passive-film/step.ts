import { createRandom } from "../../metallurgy";
import { CORROSION_RATES, CR_OXIDATION_PER_S, FILM_SPREAD_PER_S } from "./constants";
import { SITE } from "./lattice";
import { STATUS, type PassiveFilmState } from "./state";

/** A per-step seed: the same state and step count always draw the same numbers. */
export function stepSeed(seed: number, stepCount: number): number {
  return (Math.imul(seed ^ 0x5bd1e995, 0x9e3779b1) + Math.imul(stepCount + 1, 0x85ebca6b)) >>> 0;
}

/** 1 − e^(−rate·dt): probability that an event with the given rate happens within dt. */
function chance(ratePerS: number, dtS: number): number {
  return ratePerS > 0 ? 1 - Math.exp(-ratePerS * dtS) : 0;
}

/** True when a site can never change again under the current environment (until a scratch cuts it). */
export function isInert(state: PassiveFilmState, i: number, wet = isWet(state)): boolean {
  const st = state.status[i];
  if (st === STATUS.carbide || st === STATUS.rust) return true;
  if (st === STATUS.film) return state.protectedMask[i] === 1 || !wet;
  // Bare iron off the network in dry air stays bare.
  return !wet && state.kind[i] === SITE.iron && state.protectedMask[i] === 0;
}

/** True when the environment can rust iron (humid air, salt spray). */
export function isWet(state: PassiveFilmState): boolean {
  return CORROSION_RATES[state.params.environment].spreadPerS > 0;
}

/** Adds a site to the list of sites the step visits (no-op if it is already there). */
export function markLive(state: PassiveFilmState, i: number): void {
  if (state.liveFlag[i]) return;
  state.liveFlag[i] = 1;
  state.live[state.liveCount++] = i;
}

/** Rebuilds the live list from scratch, e.g. after the environment changed. */
export function rebuildLive(state: PassiveFilmState): void {
  state.liveCount = 0;
  state.liveFlag.fill(0);
  const wet = isWet(state);
  for (let i = 0; i < state.status.length; i++) if (!isInert(state, i, wet)) markLive(state, i);
}

/** Switches the environment without rebuilding the alloy (the lattice does not depend on it). */
export function setEnvironment(state: PassiveFilmState, environment: PassiveFilmState["params"]["environment"]): void {
  state.params = { ...state.params, environment };
  rebuildLive(state);
}

/**
 * Advances the surface by dtS seconds of model time (mutates and returns the state).
 * - Bare Cr sites oxidise at CR_OXIDATION_PER_S.
 * - The film spreads over bare sites anchored to the Cr network (FILM_SPREAD_PER_S per filmed anchored neighbour).
 * - In humid air or salt spray, bare iron rusts: nucleation after an induction time, then spread to bare
 *   neighbours; rust also undercuts film islands that are not anchored to the network. Dry air does not rust.
 * Each site changes at most once per step, so one step never sweeps a front across the lattice.
 * Only "live" sites (those that can still change) are visited, so a settled surface costs almost nothing.
 */
export function step(state: PassiveFilmState, dtS: number): PassiveFilmState {
  state.changedCount = 0;
  if (!(dtS > 0)) return state;
  const L = state.sizeSites;
  const rates = CORROSION_RATES[state.params.environment];
  const wet = rates.spreadPerS > 0;
  const random = createRandom(stepSeed(state.params.seed, state.stepCount));
  const t1 = state.timeS + dtS;
  const pOxidise = chance(CR_OXIDATION_PER_S, dtS);
  const pFilm = [0, 1, 2, 3, 4].map((k) => chance(FILM_SPREAD_PER_S * k, dtS));
  const pUndercut = [0, 1, 2, 3, 4].map((k) => chance(rates.undercutPerS * k, dtS));
  // Rust probability by number of rusted neighbours, before (index k) and after (k + 5) the induction time.
  const pRust = [0, 1, 2, 3, 4, 0, 1, 2, 3, 4].map((k, j) => chance(rates.spreadPerS * k + (j >= 5 ? rates.nucleationPerS : 0), dtS));
  const inductionS = rates.inductionS;
  const { status, kind, protectedMask, sinceS, live, changed } = state;
  const pendingStatus = state.pendingStatus;
  let pending = 0;

  for (let k = 0; k < state.liveCount; k++) {
    const i = live[k];
    const st = status[i];
    const x = i % L;
    const y = (i - x) / L;
    if (st === STATUS.film) {
      // Anchored film is protective; an island's film can be undercut by neighbouring rust.
      if (!wet || protectedMask[i]) continue;
      const rusted = countWithStatus(status, L, x, y, i, STATUS.rust);
      if (rusted > 0 && random() < pUndercut[rusted]) { changed[pending] = i; pendingStatus[pending++] = STATUS.rust; }
      continue;
    }
    if (st !== STATUS.bare) continue;
    if (kind[i] === SITE.chromium) {
      if (random() < pOxidise) { changed[pending] = i; pendingStatus[pending++] = STATUS.film; }
      continue;
    }
    if (protectedMask[i]) {
      const filmed = countAnchoredFilm(status, protectedMask, L, x, y, i);
      if (filmed > 0 && random() < pFilm[filmed]) { changed[pending] = i; pendingStatus[pending++] = STATUS.film; continue; }
    }
    if (!wet) continue;
    const rusted = countWithStatus(status, L, x, y, i, STATUS.rust);
    const p = pRust[t1 - sinceS[i] >= inductionS ? rusted + 5 : rusted];
    if (p > 0 && random() < p) { changed[pending] = i; pendingStatus[pending++] = STATUS.rust; }
  }

  const counts = state.counts;
  for (let k = 0; k < pending; k++) {
    const i = changed[k];
    const next = pendingStatus[k];
    decrement(counts, status[i]);
    increment(counts, next);
    status[i] = next;
    sinceS[i] = t1;
  }
  state.changedCount = pending;
  state.timeS = t1;
  state.stepCount++;
  if (pending > 0) compactLive(state);
  return state;
}

/** Drops sites that can no longer change from the live list. */
function compactLive(state: PassiveFilmState): void {
  const { live, liveFlag } = state;
  const wet = isWet(state);
  let w = 0;
  for (let k = 0; k < state.liveCount; k++) {
    const i = live[k];
    if (isInert(state, i, wet)) liveFlag[i] = 0;
    else live[w++] = i;
  }
  state.liveCount = w;
}

/** Number of 4-neighbours with the given status. */
function countWithStatus(status: Uint8Array, L: number, x: number, y: number, i: number, want: number): number {
  let c = 0;
  if (x > 0 && status[i - 1] === want) c++;
  if (x < L - 1 && status[i + 1] === want) c++;
  if (y > 0 && status[i - L] === want) c++;
  if (y < L - 1 && status[i + L] === want) c++;
  return c;
}

/** Number of 4-neighbours carrying anchored film (film on a site the network protects). */
function countAnchoredFilm(status: Uint8Array, anchored: Uint8Array, L: number, x: number, y: number, i: number): number {
  const film = STATUS.film;
  let c = 0;
  if (x > 0 && status[i - 1] === film && anchored[i - 1]) c++;
  if (x < L - 1 && status[i + 1] === film && anchored[i + 1]) c++;
  if (y > 0 && status[i - L] === film && anchored[i - L]) c++;
  if (y < L - 1 && status[i + L] === film && anchored[i + L]) c++;
  return c;
}

export function increment(counts: PassiveFilmState["counts"], st: number): void {
  if (st === STATUS.bare) counts.bare++;
  else if (st === STATUS.film) counts.film++;
  else if (st === STATUS.rust) counts.rust++;
  else counts.carbide++;
}

export function decrement(counts: PassiveFilmState["counts"], st: number): void {
  if (st === STATUS.bare) counts.bare--;
  else if (st === STATUS.film) counts.film--;
  else if (st === STATUS.rust) counts.rust--;
  else counts.carbide--;
}
