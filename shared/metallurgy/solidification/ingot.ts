import type { Element } from "../composition";
import { InputError, StabilityError } from "../errors";
import { requireInRange, requirePositive } from "../validate";
import { ARM_SPACING_FIT_MAX_CARBON_MASS_PCT, armSpacingCarbonClampWarning, armSpacingUnchecked } from "./arm-spacing";
import { clyneKurzOmegaUnchecked } from "./back-diffusion";
import { effectivePartitionUnchecked } from "./effective-partition";
import { resolveIngotParams, type IngotParams, type ResolvedIngotParams } from "./ingot-params";
import { PARTITION_DATA } from "./partition-data";
import { arrheniusDiffusivity, SOLID_DIFFUSION_DATA, type SolidDiffusionDatum } from "./solid-diffusion";

/**
 * 1-D ingot solidification: explicit finite-volume conduction on a vertex grid from the
 * mould wall (node 0, on the surface) to the centre (last node, symmetry plane/axis), with
 * latent heat by the enthalpy method or an effective heat capacity, a convective or
 * fixed-temperature wall, and per-node solute tracking on two scales:
 *  - macro: the remaining liquid is one well-mixed pool; solid forming anywhere in a step
 *    takes k_eff·C_pool (Burton–Prim–Slichter k_eff from the front speed and the
 *    boundary-layer "mixing" control), integrated exactly over the step (ingot-scale Scheil).
 *    This gives the wall→centre macrosegregation profile (positive at the centre).
 *    Ingot-scale Scheil diverges as the last liquid vanishes (C_pool = C0·f_L^(k_eff − 1)): the
 *    last liquid really is the most enriched, but without a bound the last node to freeze would
 *    take C0·(V_node/V_total)^(k − 1) — a spike that grows as the grid is refined (≈ 100–180 × C0
 *    in the centre node of a 50-node cylinder with perfect mixing). The bound is the eutectic:
 *    once the pool's carbon reaches eutecticCarbonMassPct (Fe–C: 4.30 %), the remaining liquid
 *    freezes as eutectic at its own composition (Scheil with a eutectic end point,
 *    science-reference §3.1 check 6), so every solute's pool stops rising there. Without tracked
 *    carbon nothing bounds it and a warning says so;
 *  - micro: when a node is fully solid, its local freezing time, cooling rate through the
 *    freezing range, λ2 (Won & Thomas) and α = D_s·t_f/(λ2/2)² give the dendrite-core and
 *    interdendritic compositions (Scheil, Clyne–Kurz back-diffusion or lever rule).
 * Liquid fraction is linear in T between solidus and liquidus; properties are constant and
 * equal in solid and liquid; no thermo-solutal coupling, no shrinkage or flow [App model].
 * Sources: science-reference §3.1–3.6 (FTCS, stability per Incropera & DeWitt).
 * Geometry units: slab quantities are per m² of wall; cylinder ones per metre of length
 * and per radian.
 */
export interface IngotSolute {
  readonly element: Element;
  /** Nominal composition of the melt, mass %. */
  readonly nominalMassPct: number;
  /** Equilibrium partition coefficient used (primary phase of the params). */
  readonly partitionCoefficient: number;
  /** Composition of the remaining (well-mixed) liquid pool, mass %. */
  liquidPoolMassPct: number;
  /** Last effective partition coefficient applied at the front (dimensionless). */
  effectivePartitionCoefficient: number;
  /** Node mean composition, mass %: solid formed so far plus its share of the liquid pool. */
  readonly meanMassPct: Float64Array;
  /** First solid of the dendrite cores, k·mean, mass % (0 until the node is solid). */
  readonly dendriteCoreMassPct: Float64Array;
  /** Solid formed at reportSolidFraction by the micro model, mass % (0 until the node is solid). */
  readonly interdendriticMassPct: Float64Array;
  /** Solid-state Fourier number α of the node (0 until solid, or without data). */
  readonly fourierNumber: Float64Array;
  /** Solute held by the solid of each node, mass % × node volume. */
  readonly solidSolute: Float64Array;
  /** Diffusion data in the solid (null: treated as non-diffusing). */
  readonly diffusion: SolidDiffusionDatum | null;
}

/** Full state of one ingot run (typed arrays indexed by node, wall = 0); mutated in place by stepIngot. */
export interface IngotState {
  readonly params: Readonly<ResolvedIngotParams>;
  /** Number of nodes (wall = 0, centre = cells − 1). */
  readonly cells: number;
  /** Node spacing, m. */
  readonly cellSizeM: number;
  /** Distance of each node from the mould wall, m. */
  readonly positionM: Float64Array;
  /** Control volume of each node (m³ per m² of wall, or per m and radian for a cylinder). */
  readonly volume: Float64Array;
  readonly totalVolume: number;
  readonly tempC: Float64Array;
  readonly solidFraction: Float64Array;
  /** Volumetric enthalpy ρ(cT + L·f_liquid), J/m³ relative to 0 °C solid. */
  readonly enthalpyJPerM3: Float64Array;
  /** Time the node fell below the liquidus, s; −1 until then. */
  readonly liquidusTimeS: Float64Array;
  /** Time the node became fully solid, s; −1 until then. */
  readonly solidusTimeS: Float64Array;
  /** Local freezing time t_f, s; 0 until solid. */
  readonly localFreezingTimeS: Float64Array;
  /** Mean cooling rate through the freezing range (T_L − T_S)/t_f, °C/s; 0 until solid or if undefined. */
  readonly coolingRateCPerS: Float64Array;
  /** Secondary dendrite arm spacing, µm; 0 until solid or if undefined (no carbon, isothermal freezing). */
  readonly armSpacingUm: Float64Array;
  readonly solutes: readonly IngotSolute[];
  /** Largest stable time step, s (see maxStableDtS). */
  readonly maxStableDtS: number;
  readonly warnings: readonly string[];
  /**
   * Section solid fraction at which the liquid pool's carbon reached the eutectic (the rest froze
   * as eutectic at the pool composition); null until then or without tracked carbon.
   */
  eutecticSolidFraction: number | null;
  timeS: number;
  steps: number;
  /** Solid volume (same units as volume). */
  solidVolume: number;
  /** Thickness of an equivalent fully solid shell, m. */
  solidThicknessM: number;
  fullySolid: boolean;
  /** Heat that has left through the wall, J per m² of wall (or per m and radian). */
  wallHeatRemovedJ: number;
  /** Work buffers; not part of the public contract. */
  readonly work: IngotWork;
}

interface IngotWork {
  next: Float64Array;
  /** conductance[i] couples node i and i + 1, W/K per unit wall area (or per m·rad). */
  conductance: Float64Array;
  /** Wall conductance of node 0 (0 for a fixed wall, which is held instead). */
  wallConductance: number;
  maxSolid: Float64Array;
  newSolid: Float64Array;
  finalized: Uint8Array;
  carbonMassPct: number;
  hSolidus: number;
  hLiquidus: number;
  /** Index of carbon in solutes (−1: not tracked, no eutectic bound). */
  carbonIndex: number;
  /** The pool has reached the eutectic: solid now forms at the pool composition. */
  eutecticReached: boolean;
  /** Per-solute k_eff of the current step. */
  kEff: Float64Array;
  /** The same array as state.warnings (mutable here). */
  warnings: string[];
}

/**
 * Creates an ingot at its pouring temperature (see IngotState for the model).
 * Validates every parameter (InputError) and records model warnings in state.warnings.
 * Source: science-reference §3.6; mould h values are [App] illustrative.
 */
export function createIngot(params: IngotParams): IngotState {
  const warnings: string[] = [];
  const p = resolveIngotParams(params, warnings);
  const n = p.cells;
  const dx = p.halfThicknessM / (n - 1);
  const radius = p.halfThicknessM;
  const k = p.conductivityWPerMK;
  const rhoC = p.densityKgPerM3 * p.heatCapacityJPerKgK;

  const positionM = new Float64Array(n);
  const volume = new Float64Array(n);
  const conductance = new Float64Array(n - 1);
  for (let i = 0; i < n; i++) positionM[i] = i * dx;
  if (p.geometry === "slab") {
    for (let i = 0; i < n; i++) volume[i] = i === 0 || i === n - 1 ? dx / 2 : dx;
    conductance.fill(k / dx);
  } else {
    for (let i = 0; i < n; i++) {
      const r = radius - i * dx;
      const outer = i === 0 ? radius : r + dx / 2;
      const inner = i === n - 1 ? 0 : r - dx / 2;
      volume[i] = (outer * outer - inner * inner) / 2;
    }
    for (let i = 0; i < n - 1; i++) conductance[i] = (k * (radius - (i + 0.5) * dx)) / dx;
  }
  let totalVolume = 0;
  for (let i = 0; i < n; i++) totalVolume += volume[i];
  const wallArea = p.geometry === "slab" ? 1 : radius;
  const wallConductance = p.fixedWall ? 0 : p.wallHeatTransferWPerM2K * wallArea;

  // Stability: ρc·V_i ≥ Δt·ΣG_i for every free node (plain c: c_eff and the enthalpy
  // slope in the mushy zone only make nodes slower).
  let maxDt = Infinity;
  for (let i = p.fixedWall ? 1 : 0; i < n; i++) {
    let g = 0;
    if (i > 0) g += conductance[i - 1];
    if (i < n - 1) g += conductance[i];
    if (i === 0) g += wallConductance;
    maxDt = Math.min(maxDt, (rhoC * volume[i]) / g);
  }

  const hSolidus = rhoC * p.solidusTempC;
  const hLiquidus = rhoC * p.liquidusTempC + p.densityKgPerM3 * p.latentHeatJPerKg;
  const tempC = new Float64Array(n).fill(p.pourTempC);
  if (p.fixedWall) tempC[0] = p.wallSinkTempC;
  const enthalpy = new Float64Array(n);
  const solidFraction = new Float64Array(n);
  const liquidusTimeS = new Float64Array(n).fill(-1);
  const solidusTimeS = new Float64Array(n).fill(-1);
  for (let i = 0; i < n; i++) {
    enthalpy[i] = enthalpyOf(p, tempC[i]);
    solidFraction[i] = solidFractionOfTemp(p, tempC[i]);
    if (tempC[i] < p.liquidusTempC) liquidusTimeS[i] = 0;
    if (solidFraction[i] >= 1) solidusTimeS[i] = 0;
  }

  const carbonMassPct = p.composition?.C ?? 0;
  if (p.microsegregation === "back-diffusion" && p.trackedElements.length > 0 && !(carbonMassPct > 0)) {
    warnings.push("No carbon in the composition: the arm spacing (and so back-diffusion) is undefined; solutes are treated as Scheil.");
  }
  if (carbonMassPct > ARM_SPACING_FIT_MAX_CARBON_MASS_PCT) warnings.push(armSpacingCarbonClampWarning(carbonMassPct));
  const solutes: IngotSolute[] = p.trackedElements.map((element) => {
    const datum = PARTITION_DATA[element]!;
    const kEq = p.partitionPhase === "gamma" ? datum.kGamma : datum.kDelta;
    const diffusion = SOLID_DIFFUSION_DATA[element]?.[p.partitionPhase] ?? null;
    if (p.microsegregation === "back-diffusion" && !diffusion) {
      warnings.push(`No solid diffusivity for ${element} in ${p.partitionPhase}: treated as non-diffusing (Scheil).`);
    }
    const nominal = p.composition![element];
    return {
      element,
      nominalMassPct: nominal,
      partitionCoefficient: kEq,
      liquidPoolMassPct: nominal,
      effectivePartitionCoefficient: kEq,
      meanMassPct: new Float64Array(n).fill(nominal),
      dendriteCoreMassPct: new Float64Array(n),
      interdendriticMassPct: new Float64Array(n),
      fourierNumber: new Float64Array(n),
      solidSolute: new Float64Array(n),
      diffusion,
    };
  });

  const carbonIndex = solutes.findIndex((s) => s.element === "C");
  if (solutes.length > 0 && carbonIndex < 0 && p.boundaryLayerM !== Infinity) {
    warnings.push(
      "Carbon is not tracked, so nothing bounds the enrichment of the last liquid (ingot-scale Scheil diverges as the last liquid vanishes): the last nodes to freeze are exaggerated, the more so the finer the grid.",
    );
  }

  return {
    params: p,
    cells: n,
    cellSizeM: dx,
    positionM,
    volume,
    totalVolume,
    tempC,
    solidFraction,
    enthalpyJPerM3: enthalpy,
    liquidusTimeS,
    solidusTimeS,
    localFreezingTimeS: new Float64Array(n),
    coolingRateCPerS: new Float64Array(n),
    armSpacingUm: new Float64Array(n),
    solutes,
    maxStableDtS: maxDt,
    warnings,
    eutecticSolidFraction: null,
    timeS: 0,
    steps: 0,
    solidVolume: 0,
    solidThicknessM: 0,
    fullySolid: false,
    wallHeatRemovedJ: 0,
    work: {
      next: new Float64Array(n),
      conductance,
      wallConductance,
      maxSolid: new Float64Array(n),
      newSolid: new Float64Array(n),
      finalized: new Uint8Array(n),
      carbonMassPct,
      hSolidus,
      hLiquidus,
      carbonIndex,
      eutecticReached: false,
      kEff: new Float64Array(solutes.length),
      warnings,
    },
  };
}

/**
 * Largest stable explicit time step of this ingot, s: min over free nodes of ρcV_i/ΣG_i
 * (interior Fo ≤ ½, wall node Fo(1 + Bi) ≤ ½; the cylinder's axis node is stricter).
 * Source: Incropera & DeWitt stability criteria [Pub, mem]; science-reference §3.6.
 */
export function maxStableDtS(state: IngotState): number {
  return state.maxStableDtS;
}

/**
 * Advances the ingot by dtS seconds (one explicit step; no allocation).
 * Throws StabilityError when dtS exceeds maxStableDtS(state), InputError for dtS ≤ 0.
 * Source: science-reference §3.6 (FTCS); solute model §3.1 (see IngotState).
 */
export function stepIngot(state: IngotState, dtS: number): IngotState {
  if (!(dtS > 0) || !Number.isFinite(dtS)) throw new InputError("dtS", dtS, "a finite time step > 0 s");
  if (dtS > state.maxStableDtS * (1 + 1e-12)) throw new StabilityError(dtS, state.maxStableDtS);
  const p = state.params;
  const w = state.work;
  const n = state.cells;
  const T = state.tempC;
  const H = state.enthalpyJPerM3;
  const fs = state.solidFraction;
  const V = state.volume;
  const G = w.conductance;
  const next = w.next;
  const enthalpyMethod = p.latentHeatMethod === "enthalpy";
  const rho = p.densityKgPerM3;
  const c = p.heatCapacityJPerKgK;
  const rhoC = rho * c;
  const tl = p.liquidusTempC;
  const ts = p.solidusTempC;
  const range = tl - ts;
  const cEffMushy = range > 0 ? c + p.latentHeatJPerKg / range : c;
  const first = p.fixedWall ? 1 : 0;

  // 1. Heat balance of every free node from the old temperatures.
  for (let i = first; i < n; i++) {
    const ti = T[i];
    let q = 0;
    if (i > 0) q += G[i - 1] * (T[i - 1] - ti);
    else q += w.wallConductance * (p.wallSinkTempC - ti);
    if (i < n - 1) q += G[i] * (T[i + 1] - ti);
    if (enthalpyMethod) next[i] = H[i] + (dtS * q) / V[i];
    else {
      const ceff = ti < tl && ti > ts ? cEffMushy : c;
      next[i] = ti + (dtS * q) / (V[i] * rho * ceff);
    }
  }
  if (p.fixedWall) state.wallHeatRemovedJ += dtS * G[0] * (T[1] - T[0]);
  else state.wallHeatRemovedJ += dtS * w.wallConductance * (T[0] - p.wallSinkTempC);

  // 2. New temperatures, solid fractions and liquidus/solidus crossing times.
  const t0 = state.timeS;
  const hS = w.hSolidus;
  const hL = w.hLiquidus;
  for (let i = first; i < n; i++) {
    let oldP: number;
    let newP: number;
    let pL: number;
    let pS: number;
    if (enthalpyMethod) {
      oldP = H[i];
      newP = next[i];
      pL = hL;
      pS = hS;
      H[i] = newP;
      if (newP <= hS) {
        T[i] = newP / rhoC;
        fs[i] = 1;
      } else if (newP >= hL) {
        T[i] = (newP / rho - p.latentHeatJPerKg) / c;
        fs[i] = 0;
      } else {
        const frac = (hL - newP) / (hL - hS);
        T[i] = tl - frac * range;
        fs[i] = frac;
      }
    } else {
      oldP = T[i];
      newP = next[i];
      pL = tl;
      pS = ts;
      T[i] = newP;
      H[i] = enthalpyOf(p, newP);
      fs[i] = solidFractionOfTemp(p, newP);
    }
    if (state.liquidusTimeS[i] < 0 && newP < pL) {
      state.liquidusTimeS[i] = t0 + dtS * crossingFraction(oldP, newP, pL);
    }
    if (state.solidusTimeS[i] < 0 && fs[i] >= 1) {
      const tSol = t0 + dtS * crossingFraction(oldP, newP, pS);
      state.solidusTimeS[i] = tSol;
      const tf = Math.max(0, tSol - Math.max(0, state.liquidusTimeS[i]));
      state.localFreezingTimeS[i] = tf;
      const rate = tf > 0 && range > 0 ? range / tf : 0;
      state.coolingRateCPerS[i] = rate;
      state.armSpacingUm[i] = rate > 0 && w.carbonMassPct > 0 ? armSpacingUnchecked(rate, w.carbonMassPct) : 0;
    }
  }

  // 3. Solute: new solid takes k_eff × pool composition (exact Scheil update over the step).
  updateSolutes(state, dtS);

  state.timeS = t0 + dtS;
  state.steps += 1;
  return state;
}

function crossingFraction(oldP: number, newP: number, threshold: number): number {
  if (oldP <= threshold) return 0;
  const f = (oldP - threshold) / (oldP - newP);
  return f < 0 ? 0 : f > 1 ? 1 : f;
}

function updateSolutes(state: IngotState, dtS: number): void {
  const w = state.work;
  const n = state.cells;
  const fs = state.solidFraction;
  const V = state.volume;
  const maxSolid = w.maxSolid;
  const newSolid = w.newSolid;
  let dV = 0;
  for (let i = 0; i < n; i++) {
    // Solid that remelts is ignored for the solute (the conduction model only cools).
    const inc = fs[i] - maxSolid[i];
    if (inc > 0) {
      newSolid[i] = inc * V[i];
      maxSolid[i] = fs[i];
      dV += newSolid[i];
    } else newSolid[i] = 0;
  }
  const solutes = state.solutes;
  const liquidOld = state.totalVolume - state.solidVolume;
  let liquidNew = liquidOld - dV;
  const lastLiquid = liquidNew <= state.totalVolume * 1e-13;
  if (lastLiquid) liquidNew = 0;
  if (dV > 0) {
    const p = state.params;
    // Front speed: solid volume rate over the current front area (slab: 1; cylinder: r_front).
    const frontArea = p.geometry === "slab" ? 1 : Math.sqrt(2 * liquidOld);
    const velocity = frontArea > 0 ? dV / (dtS * frontArea) : Infinity;
    const kEff = w.kEff;
    for (let s = 0; s < solutes.length; s++) {
      kEff[s] = effectivePartitionUnchecked(solutes[s].partitionCoefficient, velocity, p.boundaryLayerM, p.liquidDiffusivityM2PerS);
      solutes[s].effectivePartitionCoefficient = kEff[s];
    }
    // Scheil from liquidOld down to liquidSplit, eutectic (solid = pool composition) below it.
    let liquidSplit = liquidNew;
    if (w.eutecticReached) liquidSplit = liquidOld;
    else if (w.carbonIndex >= 0 && kEff[w.carbonIndex] < 1) {
      // Liquid volume at which the carbon pool reaches C_E: L = L_old·(C_E/C_pool)^(1/(k − 1)).
      const poolC = solutes[w.carbonIndex].liquidPoolMassPct;
      const atEutectic = liquidOld * Math.pow(p.eutecticCarbonMassPct / poolC, 1 / (kEff[w.carbonIndex] - 1));
      if (atEutectic > liquidNew) {
        liquidSplit = Math.min(liquidOld, atEutectic);
        w.eutecticReached = true;
        const fraction = 1 - liquidSplit / state.totalVolume;
        state.eutecticSolidFraction = fraction;
        if (1 - fraction >= 1e-3) {
          w.warnings.push(
            `The last liquid reached the Fe–C eutectic carbon (${p.eutecticCarbonMassPct} % C) with ${(100 * (1 - fraction)).toPrecision(2)} % of the section still liquid; ` +
              "that liquid is taken to freeze as eutectic at its own composition, which bounds the centre's enrichment. Cr, V, Mo and W lower the eutectic carbon, so for alloy steels this bound is an upper limit.",
          );
        }
      }
    }
    for (let s = 0; s < solutes.length; s++) {
      const sol = solutes[s];
      const pool = sol.liquidPoolMassPct;
      let toSolid: number;
      if (liquidSplit >= liquidOld) {
        toSolid = lastLiquid ? pool * liquidOld : pool * (liquidOld - liquidNew);
      } else if (lastLiquid && liquidSplit <= 0) {
        toSolid = pool * liquidOld; // the Scheil pool would diverge; all solute left goes to the last solid
      } else {
        const poolAtSplit = pool * Math.pow(liquidSplit / liquidOld, kEff[s] - 1);
        toSolid = pool * liquidOld - poolAtSplit * liquidNew;
        sol.liquidPoolMassPct = poolAtSplit;
      }
      const perVolume = toSolid / dV;
      const solid = sol.solidSolute;
      for (let i = 0; i < n; i++) if (newSolid[i] > 0) solid[i] += perVolume * newSolid[i];
    }
    state.solidVolume = lastLiquid ? state.totalVolume : state.solidVolume + dV;
    state.solidThicknessM =
      state.params.geometry === "slab" ? state.solidVolume : state.params.halfThicknessM - Math.sqrt(2 * Math.max(0, state.totalVolume - state.solidVolume));
    if (lastLiquid) state.fullySolid = true;
  }
  for (let s = 0; s < solutes.length; s++) {
    const sol = solutes[s];
    const pool = sol.liquidPoolMassPct;
    for (let i = 0; i < n; i++) sol.meanMassPct[i] = sol.solidSolute[i] / V[i] + (1 - maxSolid[i]) * pool;
  }
  // Micro-segregation of nodes that have just become fully solid.
  for (let i = 0; i < n; i++) {
    if (w.finalized[i] === 0 && maxSolid[i] >= 1) {
      w.finalized[i] = 1;
      finalizeNode(state, i);
    }
  }
  if (!state.fullySolid) {
    let all = true;
    for (let i = 0; i < n; i++) if (maxSolid[i] < 1) all = false;
    if (all) state.fullySolid = true;
  }
}

function finalizeNode(state: IngotState, i: number): void {
  const p = state.params;
  const fr = p.reportSolidFraction;
  const tf = state.localFreezingTimeS[i];
  const lambda2 = state.armSpacingUm[i];
  const halfSpacingM = lambda2 * 0.5e-6;
  const midTempC = 0.5 * (p.liquidusTempC + p.solidusTempC);
  for (let s = 0; s < state.solutes.length; s++) {
    const sol = state.solutes[s];
    const k = sol.partitionCoefficient;
    const mean = sol.solidSolute[i] / state.volume[i];
    sol.meanMassPct[i] = mean;
    sol.dendriteCoreMassPct[i] = k * mean;
    let inter: number;
    if (p.microsegregation === "lever") {
      inter = (k * mean) / (1 - (1 - k) * fr);
    } else {
      let alpha = 0;
      if (p.microsegregation === "back-diffusion" && sol.diffusion && halfSpacingM > 0) {
        alpha = (arrheniusDiffusivity(sol.diffusion, midTempC) * tf) / (halfSpacingM * halfSpacingM) + p.coarseningAlpha;
      } else if (p.microsegregation === "back-diffusion" && sol.diffusion) alpha = p.coarseningAlpha;
      sol.fourierNumber[i] = alpha;
      const beta = 2 * clyneKurzOmegaUnchecked(alpha) * k;
      inter = k * mean * Math.pow(1 - (1 - beta) * fr, (k - 1) / (1 - beta));
    }
    sol.interdendriticMassPct[i] = inter;
  }
}

function enthalpyOf(p: ResolvedIngotParams, tempC: number): number {
  return p.densityKgPerM3 * (p.heatCapacityJPerKgK * tempC + p.latentHeatJPerKg * (1 - solidFractionOfTemp(p, tempC)));
}

function solidFractionOfTemp(p: ResolvedIngotParams, tempC: number): number {
  if (tempC >= p.liquidusTempC) return 0;
  if (tempC <= p.solidusTempC) return 1;
  return (p.liquidusTempC - tempC) / (p.liquidusTempC - p.solidusTempC);
}

/** Options of runIngotUntilSolid. */
export interface RunIngotOptions {
  /** Time step, s; default 0.95 × maxStableDtS. */
  dtS?: number;
  /** Give up after this simulated time, s (default 1e7). */
  maxTimeS?: number;
}

/** Summary returned by runIngotUntilSolid. */
export interface RunIngotResult {
  steps: number;
  timeS: number;
  fullySolid: boolean;
}

/**
 * Steps the ingot until it is fully solid (or maxTimeS is reached) and reports the step
 * count and time. Same model and errors as stepIngot.
 */
export function runIngotUntilSolid(state: IngotState, options: RunIngotOptions = {}): RunIngotResult {
  const dt = options.dtS ?? 0.95 * state.maxStableDtS;
  requirePositive("dtS", dt);
  const maxTime = requireInRange("maxTimeS", options.maxTimeS ?? 1e7, { min: 0, minExclusive: true });
  const start = state.steps;
  while (!state.fullySolid && state.timeS < maxTime) stepIngot(state, dt);
  return { steps: state.steps - start, timeS: state.timeS, fullySolid: state.fullySolid };
}

/**
 * Relative solute balance error of one tracked element, (solute in solid + in the liquid pool
 * − nominal × volume)/(nominal × volume). Conservation check for tests and the simulation.
 */
export function ingotSoluteBalanceResidual(state: IngotState, element: Element): number {
  const sol = state.solutes.find((s) => s.element === element);
  if (!sol) throw new InputError("element", element, `a tracked element (${state.solutes.map((s) => s.element).join(", ") || "none"})`);
  let total = 0;
  for (let i = 0; i < state.cells; i++) total += sol.solidSolute[i];
  total += sol.liquidPoolMassPct * (state.totalVolume - state.solidVolume);
  const nominal = sol.nominalMassPct * state.totalVolume;
  return (total - nominal) / nominal;
}

/**
 * Heat content Σ H_i·V_i of the free nodes, J per m² of wall (or per m and radian), relative
 * to solid at 0 °C. With wallHeatRemovedJ it is conserved by the enthalpy method.
 */
export function ingotHeatContentJ(state: IngotState): number {
  let sum = 0;
  for (let i = state.params.fixedWall ? 1 : 0; i < state.cells; i++) sum += state.enthalpyJPerM3[i] * state.volume[i];
  return sum;
}
