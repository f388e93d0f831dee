/**
 * Runs the core's 1-D radial ingot solver (createIngot / stepIngot) for a round ingot from
 * pouring to the last liquid, recording frames for the animation and the per-node results
 * after freezing. Pure and incremental: `advance(budgetMs)` runs for about that long and
 * returns, so a Web Worker can report progress and drop a run the user has already replaced.
 * The physics is all in shared/metallurgy; this file only chooses inputs and records.
 */
import { createIngot, maxStableDtS, stepIngot, type IngotState } from "../../metallurgy/solidification/ingot";
import type { Element } from "../../metallurgy/composition";
import { PARTITION_DATA } from "../../metallurgy/solidification/partition-data";
import { liquidusTempC } from "../../metallurgy/solidification/liquidus-solidus";
import { chvorinovTimeMin, SAND_MOULD_CONSTANT_MIN_PER_CM2 } from "../../metallurgy/solidification/chvorinov";
import { INGOT_ELEMENTS, type IngotElement } from "./constants";
import type { ResolvedIngotSimParams } from "./params";
import { boundaryLayerForMixing } from "./mixing";
import { displayArmSpacingUm } from "./arm-spacing";
import { carbideSizeUm, coarseCarbideRisk, eutecticCarbonMassPct, type CarbideRisk } from "./carbide-risk";

/** Superheat above the liquidus at pouring, °C [App]. */
export const POUR_SUPERHEAT_C = 50;
/**
 * Nodes from wall to centre. Results change by < 1 % between 50 and 100 nodes (checked for
 * 50–1500 mm ingots) while the cost falls about eightfold (it grows as the cube of the count).
 */
export const INGOT_CELLS = 50;
/** Frames kept for the animation (the recorder halves its resolution when it fills). */
export const MAX_FRAMES = 240;
/** Time step as a fraction of the stability limit. */
const DT_FRACTION = 0.95;
/** Give up after this much model time (a week); no realistic ingot takes so long. */
const MAX_MODEL_TIME_S = 7 * 24 * 3600;

export interface IngotFinal {
  localFreezingTimeS: Float64Array;
  coolingRateCPerS: Float64Array;
  /** λ2 for display (carbon term capped at 1 % C, see arm-spacing.ts), µm; 0 where undefined. */
  armSpacingUm: Float64Array;
  /** Per tracked element: node mean composition, dendrite-core solid, last (interdendritic) liquid, mass %. */
  meanMassPct: Partial<Record<IngotElement, Float64Array>>;
  dendriteCoreMassPct: Partial<Record<IngotElement, Float64Array>>;
  lastLiquidMassPct: Partial<Record<IngotElement, Float64Array>>;
  carbideRisk: CarbideRisk[];
  carbideSizeUm: Float64Array;
}

export interface IngotRun {
  sim: ResolvedIngotSimParams;
  cells: number;
  radiusM: number;
  /** Distance of each node from the mould wall, m (0 = wall, radiusM = centre). */
  positionM: Float64Array;
  liquidusC: number;
  solidusC: number;
  pourTempC: number;
  mouldTempC: number;
  /** Elements the solver tracked (those with partition data present in the alloy). */
  tracked: IngotElement[];
  nominalMassPct: Partial<Record<IngotElement, number>>;
  partitionCoefficient: Partial<Record<IngotElement, number>>;
  frameCount: number;
  frameTimeS: Float64Array;
  /** frameCount × cells, row per frame. */
  frameTempC: Float32Array;
  frameSolidFraction: Float32Array;
  frameMeanMassPct: Partial<Record<IngotElement, Float32Array>>;
  /** Composition of the liquid pool per frame. */
  framePoolMassPct: Partial<Record<IngotElement, Float32Array>>;
  final: IngotFinal;
  totalTimeS: number;
  fullySolid: boolean;
  steps: number;
  dtS: number;
  chvorinov: ChvorinovComparison;
  warnings: string[];
}

export interface ChvorinovComparison {
  /** Casting modulus V/A of a long round ingot, R/2, cm. */
  modulusCm: number;
  /** Chvorinov time with the illustrative sand constant B = 2 min/cm², n = 2, s. */
  sandRuleTimeS: number;
  /** B that would make Chvorinov's rule match this model run, min/cm². */
  equivalentConstantMinPerCm2: number;
}

export interface IngotRunner {
  /** Runs for about `budgetMs` of wall time; returns the solid fraction of the section (0–1). */
  advance(budgetMs: number): number;
  readonly done: boolean;
  /** The finished run (throws if called before `done`). */
  result(): IngotRun;
  readonly state: IngotState;
}

export function trackedElements(sim: ResolvedIngotSimParams): IngotElement[] {
  return INGOT_ELEMENTS.filter((el) => (sim.composition[el] ?? 0) > 0 && PARTITION_DATA[el as Element] !== undefined);
}

export function createIngotRunner(sim: ResolvedIngotSimParams, cells = INGOT_CELLS, now: () => number = defaultNow): IngotRunner {
  return buildRunner(sim, cells, trackedElements(sim), sim.sizeMm / 2000, now);
}

function buildRunner(sim: ResolvedIngotSimParams, cells: number, tracked: IngotElement[], radiusM: number, now: () => number): IngotRunner {
  const pourTempC = liquidusTempC(sim.composition).value + POUR_SUPERHEAT_C;
  const state = createIngot({
    geometry: "cylinder",
    halfThicknessM: radiusM,
    cells,
    pourTempC,
    composition: sim.composition,
    wall: { type: "mould", mould: sim.mould },
    trackedElements: tracked,
    boundaryLayerM: boundaryLayerForMixing(sim.mixing),
  });
  const dtS = DT_FRACTION * maxStableDtS(state);
  const recorder = createRecorder(cells, tracked);
  recorder.record(state);
  let done = false;

  return {
    state,
    get done() {
      return done;
    },
    advance(budgetMs: number) {
      const start = now();
      let sinceCheck = 0;
      while (!done) {
        stepIngot(state, dtS);
        if (state.timeS >= recorder.nextTimeS) recorder.record(state);
        if (state.fullySolid || state.timeS >= MAX_MODEL_TIME_S) {
          recorder.record(state, true);
          done = true;
          break;
        }
        // Reading the clock costs more than a step of 100 nodes: check every 64 steps.
        if (++sinceCheck >= 64) {
          sinceCheck = 0;
          if (now() - start >= budgetMs) break;
        }
      }
      return done ? 1 : state.solidVolume / state.totalVolume;
    },
    result() {
      if (!done) throw new Error("The ingot run has not finished.");
      return finish(sim, state, tracked, recorder, radiusM, pourTempC, dtS);
    },
  };
}

/**
 * Runs to the end in one go (tests, the powder page's comparison ingot, the benchmark).
 * `solutes: false` skips the solute bookkeeping (the Chvorinov sweep needs only the time).
 */
export function runIngot(sim: ResolvedIngotSimParams, cells = INGOT_CELLS, options: { solutes?: boolean } = {}): IngotRun {
  const tracked = options.solutes === false ? [] : trackedElements(sim);
  const runner = buildRunner(sim, cells, tracked, sim.sizeMm / 2000, defaultNow);
  while (!runner.done) runner.advance(Infinity);
  return runner.result();
}

function finish(
  sim: ResolvedIngotSimParams,
  state: IngotState,
  tracked: IngotElement[],
  recorder: Recorder,
  radiusM: number,
  pourTempC: number,
  dtS: number,
): IngotRun {
  const n = state.cells;
  const nominalMassPct: Partial<Record<IngotElement, number>> = {};
  const partitionCoefficient: Partial<Record<IngotElement, number>> = {};
  const meanMassPct: IngotFinal["meanMassPct"] = {};
  const dendriteCoreMassPct: IngotFinal["dendriteCoreMassPct"] = {};
  const lastLiquidMassPct: IngotFinal["lastLiquidMassPct"] = {};
  for (const sol of state.solutes) {
    const el = sol.element as IngotElement;
    nominalMassPct[el] = sol.nominalMassPct;
    partitionCoefficient[el] = sol.partitionCoefficient;
    meanMassPct[el] = Float64Array.from(sol.meanMassPct);
    dendriteCoreMassPct[el] = Float64Array.from(sol.dendriteCoreMassPct);
    // The core reports the solid forming at f_s = 0.95; the liquid it forms from is C_s*/k.
    lastLiquidMassPct[el] = Float64Array.from(sol.interdendriticMassPct, (c) => c / sol.partitionCoefficient);
  }
  // A liquid richer in carbon than the eutectic does not exist: once there, the rest freezes as
  // eutectic (Scheil with a eutectic end point, science-reference §3.1), so C/k above it is capped.
  const lastC = lastLiquidMassPct.C;
  if (lastC) {
    for (let i = 0; i < n; i++) lastC[i] = Math.min(lastC[i], eutecticCarbonMassPct(lastLiquidMassPct.Cr?.[i] ?? 0));
  }
  const carbideRisk: CarbideRisk[] = [];
  const carbideSize = new Float64Array(n);
  const armSpacing = new Float64Array(n);
  const carbon = sim.composition.C ?? 0;
  const warnings = [...state.warnings];
  for (let i = 0; i < n; i++) {
    const lambda = displayArmSpacingUm(state.coolingRateCPerS[i], carbon);
    armSpacing[i] = lambda?.valueUm ?? 0;
    if (lambda?.carbonCapped && i === 0) warnings.push(lambda.warnings[lambda.warnings.length - 1]);
    const risk = coarseCarbideRisk({ V: lastLiquidMassPct.V?.[i], C: lastLiquidMassPct.C?.[i], Cr: lastLiquidMassPct.Cr?.[i] });
    carbideRisk.push(risk);
    carbideSize[i] = risk === "none" ? 0 : carbideSizeUm(armSpacing[i]);
  }

  const modulusCm = (radiusM * 100) / 2;
  const sandRule = chvorinovTimeMin({ volumeCm3: modulusCm, areaCm2: 1, mouldConstantMinPerCm2: SAND_MOULD_CONSTANT_MIN_PER_CM2 });
  const frames = recorder.frames();
  return {
    sim,
    cells: n,
    radiusM,
    positionM: Float64Array.from(state.positionM),
    liquidusC: state.params.liquidusTempC,
    solidusC: state.params.solidusTempC,
    pourTempC,
    mouldTempC: state.params.wallSinkTempC,
    tracked,
    nominalMassPct,
    partitionCoefficient,
    ...frames,
    final: {
      localFreezingTimeS: Float64Array.from(state.localFreezingTimeS),
      coolingRateCPerS: Float64Array.from(state.coolingRateCPerS),
      armSpacingUm: armSpacing,
      meanMassPct,
      dendriteCoreMassPct,
      lastLiquidMassPct,
      carbideRisk,
      carbideSizeUm: carbideSize,
    },
    totalTimeS: state.timeS,
    fullySolid: state.fullySolid,
    steps: state.steps,
    dtS,
    chvorinov: {
      modulusCm,
      sandRuleTimeS: sandRule.value * 60,
      equivalentConstantMinPerCm2: state.timeS / 60 / (modulusCm * modulusCm),
    },
    warnings: [...new Set([...warnings, ...(state.fullySolid ? [] : ["The ingot had not finished freezing after a week of model time."])])],
  };
}

interface Recorder {
  nextTimeS: number;
  record(state: IngotState, force?: boolean): void;
  frames(): Pick<IngotRun, "frameCount" | "frameTimeS" | "frameTempC" | "frameSolidFraction" | "frameMeanMassPct" | "framePoolMassPct">;
}

/**
 * Keeps at most MAX_FRAMES evenly spaced frames without knowing the total time in advance:
 * it records every `interval` seconds of model time and, when full, drops every other frame
 * and doubles the interval.
 */
function createRecorder(cells: number, tracked: IngotElement[]): Recorder {
  const cap = MAX_FRAMES;
  let count = 0;
  let interval = 0;
  const times = new Float64Array(cap);
  const temps = new Float32Array(cap * cells);
  const solids = new Float32Array(cap * cells);
  const means = Object.fromEntries(tracked.map((el) => [el, new Float32Array(cap * cells)])) as Record<IngotElement, Float32Array>;
  const pools = Object.fromEntries(tracked.map((el) => [el, new Float32Array(cap)])) as Record<IngotElement, Float32Array>;

  // Keep the frames on even points of the time grid (not even indices: a grid point can be
  // missed or doubled by rounding), then double the grid.
  const compact = () => {
    let w = 0;
    for (let r = 0; r < count; r++) {
      if (r > 0 && Math.round(times[r] / interval) % 2 !== 0) continue;
      if (w > 0 && Math.round(times[r] / (2 * interval)) === Math.round(times[w - 1] / (2 * interval))) continue;
      if (r !== w) {
        times[w] = times[r];
        temps.copyWithin(w * cells, r * cells, (r + 1) * cells);
        solids.copyWithin(w * cells, r * cells, (r + 1) * cells);
        for (const el of tracked) {
          means[el].copyWithin(w * cells, r * cells, (r + 1) * cells);
          pools[el][w] = pools[el][r];
        }
      }
      w++;
    }
    count = w;
    interval *= 2;
  };

  const recorder: Recorder = {
    nextTimeS: 0,
    record(state, force = false) {
      if (count > 0 && times[count - 1] === state.timeS) return;
      if (count === cap) compact();
      if (count === cap) count -= 1; // compaction could not free a row: overwrite the last
      const row = count * cells;
      times[count] = state.timeS;
      for (let i = 0; i < cells; i++) {
        temps[row + i] = state.tempC[i];
        solids[row + i] = state.solidFraction[i];
      }
      for (const sol of state.solutes) {
        const el = sol.element as IngotElement;
        means[el].set(sol.meanMassPct, row);
        pools[el][count] = sol.liquidPoolMassPct;
      }
      count++;
      if (interval === 0 && state.timeS > 0) interval = state.timeS; // first step sets the pace
      // Next frame on a fixed grid of the interval, so frames stay evenly spaced after halving.
      const grid = Math.max(interval, 1e-9);
      // (A step that lands a rounding error short of a grid point still counts as on it.)
      recorder.nextTimeS = grid * (Math.floor(state.timeS / grid + 1e-6) + 1 - 1e-6);
    },
    frames() {
      return {
        frameCount: count,
        frameTimeS: times.slice(0, count),
        frameTempC: temps.slice(0, count * cells),
        frameSolidFraction: solids.slice(0, count * cells),
        frameMeanMassPct: Object.fromEntries(tracked.map((el) => [el, means[el].slice(0, count * cells)])),
        framePoolMassPct: Object.fromEntries(tracked.map((el) => [el, pools[el].slice(0, count)])),
      };
    },
  };
  return recorder;
}

function defaultNow(): number {
  return typeof performance !== "undefined" ? performance.now() : Date.now();
}
