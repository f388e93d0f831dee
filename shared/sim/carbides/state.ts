import { ABRASIVES, type CarbideType } from "../../metallurgy";
import { growthFactors } from "./coarsening";
import { resolveAlloy, type ResolvedAlloy } from "./composition";
import { STONE_ABRASIVE } from "./constants";
import { cloneEdge, createEdge, type EdgeState } from "./edge-grid";
import { edgeMetrics, type EdgeMetrics } from "./edge-metrics";
import { sharpenStrokes } from "./edge-sharpen";
import { wearCycles } from "./edge-wear";
import { sampleBaseField, selectVisible, type BaseField, type VisibleField } from "./field";
import { referencePoint, wearIndices, type GradeIndexPoint, type WearIndices } from "./indices";
import type { CarbideParams } from "./params";
import { carbidePopulation, type CarbidePopulationState } from "./population";

/** Rates of the animation clock at speed 1 (model units per real second). [App] */
export const CLOCK_RATES = { hoursPerS: 4, cyclesPerS: 60, strokesPerS: 40 } as const;

/** The edge is worn to this bluntness (width 3 µm below the tip) before a sharpening run starts, µm. */
export const STANDARD_WORN_WIDTH_UM = 8;

export interface CarbideSimState {
  params: CarbideParams;
  alloy: ResolvedAlloy;
  population: CarbidePopulationState;
  indices: WearIndices;
  reference: GradeIndexPoint;
  base: BaseField;
  /** Time at temperature shown now, h (starts at params.coarseningHours). */
  hours: number;
  growth: Partial<Record<CarbideType, number>>;
  visible: VisibleField;
  /** The edge cross-section (built on first use). */
  edge: EdgeState | null;
  /** The worn edge a sharpening run started from (for Reset of the sharpening view). */
  wornEdge: EdgeState | null;
  /** Fractional cycles/strokes carried between steps. */
  carry: number;
  /** Bumped on every change a view must redraw. */
  version: number;
}

/** Target area fraction of each present carbide type (0–1). */
export function targetFractions(pop: CarbidePopulationState): Partial<Record<CarbideType, number>> {
  const out: Partial<Record<CarbideType, number>> = {};
  for (const p of pop.phases) out[p.type] = p.volumePct / 100;
  return out;
}

/** Everything that depends on composition, state and temperature, from a base field already sampled. */
export function stateFromBase(params: CarbideParams, base: BaseField): CarbideSimState {
  const alloy = resolveAlloy(params);
  const population = carbidePopulation(alloy.composition, params.state, alloy.austenitizingTempC);
  const hours = params.coarseningHours;
  const growth = growthFactors(base.types, alloy.austenitizingTempC, hours);
  return {
    params,
    alloy,
    population,
    indices: wearIndices(population, params.abrasive),
    reference: referencePoint(params.state, params.abrasive),
    base,
    hours,
    growth,
    visible: selectVisible(base, targetFractions(population), growth),
    edge: null,
    wornEdge: null,
    carry: 0,
    version: 0,
  };
}

/** Samples the annealed field for the parameters' composition and seed (the costly part: run in a worker). */
export function baseFieldFor(params: CarbideParams): BaseField {
  const alloy = resolveAlloy(params);
  const population = carbidePopulation(alloy.composition, "annealed", alloy.austenitizingTempC);
  return sampleBaseField({ annealed: population.annealed, fieldUm: params.fieldUm, seed: params.seed, sizeModel: params.sizeModel });
}

/** The full initial state of the simulation (deterministic for a seed). */
export function initialState(params: CarbideParams): CarbideSimState {
  return stateFromBase(params, baseFieldFor(params));
}

/** Sets the time at temperature (h) and reselects the coarsened field. */
export function setHours(state: CarbideSimState, hours: number): CarbideSimState {
  state.hours = Math.max(0, Math.min(100, hours));
  const growth = growthFactors(state.base.types, state.alloy.austenitizingTempC, state.hours);
  // Below a 0.01 % change in every radius since the last selection nothing visible moves: keep it
  // (and its growth factors, so slow changes still add up).
  const moved = state.base.types.some((t) => Math.abs((growth[t] ?? 1) / (state.growth[t] ?? 1) - 1) > 1e-4);
  if (!moved) return state;
  state.growth = growth;
  state.visible = selectVisible(state.base, targetFractions(state.population), state.growth);
  state.edge = null;
  state.wornEdge = null;
  state.version++;
  return state;
}

/** The edge cross-section, built from the field now shown. */
export function ensureEdge(state: CarbideSimState): EdgeState {
  if (!state.edge) state.edge = createEdge(state.base, state.visible, state.population.matrixHv);
  return state.edge;
}

/** Wears the edge to the standard bluntness if it is still sharp, and remembers it as the sharpening start. */
export function ensureWornEdge(state: CarbideSimState): EdgeState {
  const edge = ensureEdge(state);
  if (!state.wornEdge) {
    for (let i = 0; i < 400 && edgeMetrics(edge).tipWidthUm < STANDARD_WORN_WIDTH_UM; i++) wearCycles(edge, 10);
    edge.strokes = 0;
    state.wornEdge = cloneEdge(edge);
  }
  return edge;
}

export function stoneHv(state: CarbideSimState): number {
  return ABRASIVES[STONE_ABRASIVE[state.params.abrasive]].typicalHv;
}

/**
 * Advances the view's clock by dtS real seconds at `speed`: coarsening time (field), cutting cycles (edge)
 * or sharpening strokes until the edge is restored (sharpen). Returns false when there is nothing left to do.
 */
export function step(state: CarbideSimState, dtS: number, speed = 1): boolean {
  const view = state.params.view;
  if (view === "field") {
    if (state.hours >= 100) return false;
    setHours(state, state.hours + dtS * speed * CLOCK_RATES.hoursPerS);
    return true;
  }
  if (view === "edge") {
    const edge = ensureEdge(state);
    state.carry += dtS * speed * CLOCK_RATES.cyclesPerS;
    const n = Math.floor(state.carry);
    state.carry -= n;
    if (n > 0) { wearCycles(edge, n); state.version++; }
    return edgeMetrics(edge).tipWidthUm < state.edge!.size * state.edge!.cellUm * 0.6;
  }
  if (view === "sharpen") {
    const edge = ensureWornEdge(state);
    if (edgeMetrics(edge).sharp) return false;
    state.carry += dtS * speed * CLOCK_RATES.strokesPerS;
    const n = Math.floor(state.carry);
    state.carry -= n;
    for (let k = 0; k < n; k++) {
      sharpenStrokes(edge, stoneHv(state), 1);
      if (edgeMetrics(edge).sharp) break;
    }
    if (n > 0) state.version++;
    return !edgeMetrics(edge).sharp;
  }
  return false;
}

/** Key numbers of the edge now shown (null before the edge exists). */
export function currentEdgeMetrics(state: CarbideSimState): EdgeMetrics | null {
  return state.edge ? edgeMetrics(state.edge) : null;
}
