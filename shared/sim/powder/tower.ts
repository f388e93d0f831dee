/**
 * The atomising tower as an animation: droplets leave the nozzle continuously, each drawn at
 * random from the size classes in proportion to their mass, and each follows its class's
 * recorded flight (fall, temperature, solid fraction from the core's droplet model). The
 * simulation clock runs in model seconds; the view chooses how fast it plays. Seeded; pure
 * apart from the mutable state object it is given.
 */
import { createRandom, type RandomSource } from "../../metallurgy/random";
import type { ClassResult } from "./classes";
import { fallAt } from "./classes";

export interface TowerDroplet {
  classIndex: number;
  /** Position across the spray cone, −1 … 1. */
  spread: number;
  birthS: number;
}

export interface TowerState {
  timeS: number;
  droplets: TowerDroplet[];
  /** Model time of the next emission. */
  nextEmitS: number;
  random: RandomSource;
}

export interface TowerLayout {
  /** Height of the tower drawn, m. */
  heightM: number;
  /** Model seconds per displayed second at 1× (chosen so the coarse droplets take ~4 s to freeze). */
  modelSecondsPerSecond: number;
  /** Droplets per model second leaving the nozzle. */
  emitPerS: number;
  /** Model time each class needs to reach the bottom of the drawn tower, s. */
  lifeS: number[];
  cumulativeMass: number[];
}

/** About this many droplets are in view at once. */
export const VISIBLE_DROPLETS = 140;

export function towerLayout(classes: readonly ClassResult[]): TowerLayout {
  // The drawn tower reaches 30 % below where the coarsest few per cent of the powder is solid.
  const total = classes.reduce((sum, c) => sum + c.massFraction, 0);
  const cumulativeMass: number[] = [];
  let cumulative = 0;
  let coarseIndex = -1;
  classes.forEach((c, i) => {
    cumulative += c.massFraction / total;
    cumulativeMass.push(cumulative);
    if (coarseIndex < 0 && cumulative >= 0.975) coarseIndex = i;
  });
  const coarse = classes[coarseIndex < 0 ? classes.length - 1 : coarseIndex];
  const solidFalls = classes.map((c) => c.solidAtFallM).filter((f) => Number.isFinite(f));
  const coarseFall = Number.isFinite(coarse.solidAtFallM) ? coarse.solidAtFallM : Math.max(0.05, ...solidFalls);
  const heightM = niceCeiling(1.3 * Math.max(coarseFall, 0.02));
  const lifeS = classes.map((c) => timeToFall(c, heightM));
  const coarseFreezeS = coarse.flight.solidificationEndTimeS > 0 ? coarse.flight.solidificationEndTimeS : lifeS[lifeS.length - 1];
  const modelSecondsPerSecond = Math.max(1e-5, coarseFreezeS / 4);
  const meanLife = classes.reduce((sum, c, i) => sum + (c.massFraction / total) * lifeS[i], 0);
  return { heightM, modelSecondsPerSecond, emitPerS: VISIBLE_DROPLETS / meanLife, lifeS, cumulativeMass };
}

export function createTower(seed = 11): TowerState {
  return { timeS: 0, droplets: [], nextEmitS: 0, random: createRandom(seed) };
}

/** Advance the tower by dtS model seconds: emit new droplets, drop those past the bottom. */
export function stepTower(state: TowerState, layout: TowerLayout, dtS: number): void {
  const end = state.timeS + dtS;
  const interval = 1 / layout.emitPerS;
  // At most a frame's worth of emissions even after a long pause.
  if (end - state.nextEmitS > 2 * VISIBLE_DROPLETS * interval) state.nextEmitS = end - 2 * VISIBLE_DROPLETS * interval;
  while (state.nextEmitS <= end) {
    state.droplets.push({ classIndex: pickClass(layout.cumulativeMass, state.random()), spread: 2 * state.random() - 1, birthS: state.nextEmitS });
    state.nextEmitS += interval * (0.5 + state.random());
  }
  state.timeS = end;
  state.droplets = state.droplets.filter((d) => end - d.birthS <= layout.lifeS[d.classIndex]);
}

/** Fill the tower with droplets already in flight (so it does not start empty). */
export function primeTower(state: TowerState, layout: TowerLayout): void {
  const longest = Math.max(...layout.lifeS);
  state.timeS = -longest;
  state.nextEmitS = -longest;
  stepTower(state, layout, longest);
}

export interface DropletView {
  fallM: number;
  tempK: number;
  solidFraction: number;
  diameterM: number;
}

/** Where a droplet is and how hot, read from its class's flight record at its age. */
export function dropletAt(droplet: TowerDroplet, classes: readonly ClassResult[], nowS: number, out: DropletView): DropletView {
  const cls = classes[droplet.classIndex];
  const f = cls.flight;
  const age = Math.max(0, nowS - droplet.birthS);
  const n = f.timeS.length;
  const step = f.timeS[1] - f.timeS[0];
  const x = Math.min(n - 1, age / step);
  const i = Math.min(n - 2, Math.floor(x));
  const w = x - i;
  out.diameterM = cls.diameterM;
  if (age >= f.timeS[n - 1]) {
    // Beyond the recorded flight: keep falling at the last speed, temperature held.
    out.fallM = f.fallM[n - 1] + (age - f.timeS[n - 1]) * f.velocityMPerS[n - 1];
    out.tempK = f.tempK[n - 1];
    out.solidFraction = f.solidFraction[n - 1];
    return out;
  }
  out.fallM = f.fallM[i] + w * (f.fallM[i + 1] - f.fallM[i]);
  out.tempK = f.tempK[i] + w * (f.tempK[i + 1] - f.tempK[i]);
  out.solidFraction = f.solidFraction[i] + w * (f.solidFraction[i + 1] - f.solidFraction[i]);
  return out;
}

function pickClass(cumulative: readonly number[], u: number): number {
  for (let i = 0; i < cumulative.length; i++) if (u <= cumulative[i]) return i;
  return cumulative.length - 1;
}

function timeToFall(c: ClassResult, heightM: number): number {
  const f = c.flight;
  const n = f.timeS.length;
  for (let i = 1; i < n; i++) {
    if (f.fallM[i] >= heightM) {
      const w = (heightM - f.fallM[i - 1]) / (f.fallM[i] - f.fallM[i - 1]);
      return f.timeS[i - 1] + w * (f.timeS[i] - f.timeS[i - 1]);
    }
  }
  const v = Math.max(0.1, f.velocityMPerS[n - 1]);
  return f.timeS[n - 1] + (heightM - f.fallM[n - 1]) / v;
}

/** 1, 2 or 5 × 10^k at or above x (a tower height that makes a tidy scale). */
export function niceCeiling(x: number): number {
  const e = Math.floor(Math.log10(x));
  for (const m of [1, 2, 5, 10]) if (m * 10 ** e >= x) return m * 10 ** e;
  return 10 ** (e + 1);
}

export { fallAt };
