import { createRandom } from "../../metallurgy";
import { alloyBalance, type AlloyBalance } from "./alloy";
import { carbideAreaFraction } from "./carbide-area";
import { layoutCarbides, type CarbideParticle } from "./carbide-particles";
import { SLAB_DEPTH_LAYERS, SURFACE_SIZE } from "./constants";
import { buildSurfaceNetwork, SITE } from "./lattice";
import type { PassiveFilmParams } from "./params";
import { rebuildLive } from "./step";

/** What each surface site currently shows. */
export const STATUS = { bare: 0, film: 1, rust: 2, carbide: 3 } as const;
export type SiteStatus = (typeof STATUS)[keyof typeof STATUS];

export interface StatusCounts {
  bare: number;
  film: number;
  rust: number;
  carbide: number;
}

export interface PassiveFilmState {
  params: PassiveFilmParams;
  sizeSites: number;
  depthLayers: number;
  balance: AlloyBalance;
  particles: CarbideParticle[];
  /** Drawn carbide area fraction of the surface. */
  carbideAreaFraction: number;
  /** SITE kind per surface site (iron, chromium, carbide). */
  kind: Uint8Array;
  haloMask: Uint8Array;
  /** 1 where the surface site is part of the spanning Cr network. */
  network: Uint8Array;
  /** 1 where the film can cover the site (anchored to the network). */
  protectedMask: Uint8Array;
  connected: boolean;
  networkShareOfCr: number;
  /** Fraction of non-carbide surface sites the film can cover. */
  protectedFraction: number;
  status: Uint8Array;
  /** Model time (s) at which each site last changed status (bare since / film since / rust since). */
  sinceS: Float64Array;
  /** 1 where a scratch has cut the surface. */
  scratchMask: Uint8Array;
  scratchSites: number;
  timeS: number;
  stepCount: number;
  counts: StatusCounts;
  /** Indices of sites whose status changed in the last step or scratch (for redrawing only those pixels). */
  changed: Int32Array;
  changedCount: number;
  /** Sites the step visits (those that can still change), with a membership flag per site. */
  live: Int32Array;
  liveFlag: Uint8Array;
  liveCount: number;
  /** Scratch buffer of the step (new status of each changed site). */
  pendingStatus: Uint8Array;
}

export interface InitialStateOptions {
  /** Surface edge length in sites (default 256); smaller lattices make tests faster. */
  sizeSites?: number;
}

/**
 * A freshly exposed surface of the alloy at model time 0: every metal site bare, carbides in place.
 * Deterministic for a given seed. Costs one 3-D cluster labelling (≈ 40 ms at 256 × 256 × 16): call it in a worker.
 */
export function initialState(params: PassiveFilmParams, opts: InitialStateOptions = {}): PassiveFilmState {
  const sizeSites = opts.sizeSites ?? SURFACE_SIZE;
  const depthLayers = SLAB_DEPTH_LAYERS[params.connectivity];
  const random = createRandom(params.seed);
  const balance = alloyBalance(params);
  const layout = layoutCarbides(sizeSites, carbideAreaFraction(balance.carbideMassPct, params.carbide), random);
  const net = buildSurfaceNetwork({
    sizeSites,
    depthLayers,
    lattice: params.lattice,
    neighbours: params.neighbours,
    crAtomFraction: balance.crAtomFraction,
    carbideMask: layout.carbideMask,
    haloMask: layout.haloMask,
    random,
  });
  const n = sizeSites * sizeSites;
  const status = new Uint8Array(n);
  let carbide = 0;
  let protectedSites = 0;
  for (let i = 0; i < n; i++) {
    if (net.kind[i] === SITE.carbide) { status[i] = STATUS.carbide; carbide++; }
    protectedSites += net.protectedMask[i];
  }
  const state: PassiveFilmState = {
    params,
    sizeSites,
    depthLayers,
    balance,
    particles: layout.particles,
    carbideAreaFraction: layout.drawnAreaFraction,
    kind: net.kind,
    haloMask: layout.haloMask,
    network: net.network,
    protectedMask: net.protectedMask,
    connected: net.connected,
    networkShareOfCr: net.networkShareOfCr,
    protectedFraction: n - carbide > 0 ? protectedSites / (n - carbide) : 0,
    status,
    sinceS: new Float64Array(n),
    scratchMask: new Uint8Array(n),
    scratchSites: 0,
    timeS: 0,
    stepCount: 0,
    counts: { bare: n - carbide, film: 0, rust: 0, carbide },
    changed: new Int32Array(n),
    changedCount: 0,
    live: new Int32Array(n),
    liveFlag: new Uint8Array(n),
    liveCount: 0,
    pendingStatus: new Uint8Array(n),
  };
  rebuildLive(state);
  return state;
}

/** A deep copy (new typed arrays), e.g. to keep the pristine surface for Reset. */
export function cloneState(state: PassiveFilmState): PassiveFilmState {
  return {
    ...state,
    params: { ...state.params },
    balance: { ...state.balance },
    particles: state.particles.map((p) => ({ ...p })),
    counts: { ...state.counts },
    kind: state.kind.slice(),
    haloMask: state.haloMask.slice(),
    network: state.network.slice(),
    protectedMask: state.protectedMask.slice(),
    status: state.status.slice(),
    sinceS: state.sinceS.slice(),
    scratchMask: state.scratchMask.slice(),
    changed: state.changed.slice(),
    live: state.live.slice(),
    liveFlag: state.liveFlag.slice(),
    pendingStatus: state.pendingStatus.slice(),
  };
}
