import { ELEMENTS, validateComposition, type Composition, type Element } from "../composition";
import { InputError } from "../errors";
import { requireInRange, requireInteger, requireNonNegative, requireOneOf, requirePositive } from "../validate";
import { IRON_CARBON_POINTS } from "../heat-treatment/iron-carbon-diagram";
import { liquidusTempC, solidusTempC } from "./liquidus-solidus";
import { PARTITION_DATA, type PrimaryPhase } from "./partition-data";

/** Ingot geometry: a slab (symmetry plane at the centre) or a long cylinder (axis at the centre). */
export type IngotGeometry = "slab" | "cylinder";
/** Mould types with illustrative wall heat-transfer coefficients (MOULD_HEAT_TRANSFER_W_PER_M2K). */
export type MouldType = "sand" | "metal" | "water-cooled";
/** Latent heat by enthalpy marching or by an effective heat capacity in the freezing range (science-reference §3.6). */
export type LatentHeatMethod = "enthalpy" | "effective-heat-capacity";
/** Micro-segregation model applied inside each node (science-reference §3.1). */
export type MicrosegregationModel = "scheil" | "back-diffusion" | "lever";

/**
 * Illustrative interface heat-transfer coefficients between ingot surface and mould, W/(m²·K).
 * [App] teaching values, not measured: a sand mould insulates (tens of W/m²K effective), a
 * cast-iron ingot mould with an air gap conducts a few hundred, a water-cooled copper mould
 * a few thousand. Keep them user-tunable (IngotWall.heatTransferWPerM2K overrides).
 */
export const MOULD_HEAT_TRANSFER_W_PER_M2K: Readonly<Record<MouldType, number>> = Object.freeze({
  sand: 50,
  metal: 500,
  "water-cooled": 2000,
});

/** Thermal and solute defaults of the ingot model; tags of science-reference §3.6. */
export const INGOT_DEFAULTS = Object.freeze({
  /** Solid steel at high temperature, W/(m·K) [Mem]. */
  conductivityWPerMK: 30,
  /** kg/m³ [Mem]. */
  densityKgPerM3: 7400,
  /** J/(kg·K) [Mem]. */
  heatCapacityJPerKgK: 680,
  /** Latent heat of steel, J/kg [Mem] (2.5–2.75e5). */
  latentHeatJPerKg: 2.7e5,
  /** Solute diffusivity in liquid steel, m²/s [Mem] (order 1e-9–1e-8). */
  liquidDiffusivityM2PerS: 5e-9,
  /** Solute boundary layer ahead of the front, m [App] (mixing control; 0 = perfect mixing). */
  boundaryLayerM: 1e-4,
  /** Solid fraction at which the interdendritic composition is reported [App]. */
  reportSolidFraction: 0.95,
  /** Number of nodes from wall to centre. */
  cells: 100,
  /** Mould temperature, °C [App]. */
  mouldTempC: 25,
  /**
   * Carbon of the last liquid at which it freezes as eutectic, mass %: the Fe–C eutectic, 4.30 %
   * (ASM and Callister diagrams, science-reference §5.2 [Checked]). Alloying lowers it.
   */
  eutecticCarbonMassPct: IRON_CARBON_POINTS.asm.eutectic.carbonMassPct,
});

/** Wall boundary of the ingot: a convective mould (h, sink temperature) or a fixed surface temperature. */
export type IngotWall =
  | {
      type: "mould";
      mould: MouldType;
      /** Overrides the illustrative h of the mould type, W/(m²·K). */
      heatTransferWPerM2K?: number;
      /** Mould (sink) temperature, °C; default 25. */
      mouldTempC?: number;
    }
  | {
      /** Surface held at a fixed temperature (the analytical test cases). */
      type: "fixed-temperature";
      tempC: number;
    };

/** Inputs of the 1-D ingot solver (createIngot). */
export interface IngotParams {
  /** "slab" (half-thickness from wall to mid-plane) or "cylinder" (radius); default slab. */
  geometry?: IngotGeometry;
  /** Slab half-thickness or cylinder radius, m (1 mm – 5 m). */
  halfThicknessM: number;
  /** Nodes from the wall (index 0) to the centre (last index), 5–5000; default 100. */
  cells?: number;
  /** Uniform initial temperature, °C; must be ≥ the liquidus. */
  pourTempC: number;
  /** Alloy composition (mass %): gives the liquidus/solidus and the solutes to track. */
  composition?: Composition;
  /** Overrides the liquidus from the composition, °C. */
  liquidusTempC?: number;
  /** Overrides the solidus from the composition, °C. */
  solidusTempC?: number;
  /** Boundary at the wall; default a sand mould at 25 °C. */
  wall?: IngotWall;
  /** Latent heat treatment; default "enthalpy" (robust also for a narrow freezing range). */
  latentHeatMethod?: LatentHeatMethod;
  latentHeatJPerKg?: number;
  densityKgPerM3?: number;
  heatCapacityJPerKgK?: number;
  conductivityWPerMK?: number;
  /** Solutes to track; default every element of the composition that has partition data. */
  trackedElements?: Element[];
  /** Microsegregation model inside each cell; default "back-diffusion". */
  microsegregation?: MicrosegregationModel;
  /** Primary phase for k and solid diffusion; default "gamma". */
  partitionPhase?: PrimaryPhase;
  /** Burton–Prim–Slichter boundary layer δ, m (0 = perfect liquid mixing, Infinity = none). */
  boundaryLayerM?: number;
  liquidDiffusivityM2PerS?: number;
  /** Solid fraction (0–1, exclusive) at which the interdendritic composition is reported. */
  reportSolidFraction?: number;
  /** Extra α added for dendrite-arm coarsening (Won & Thomas use 0.1); default 0. */
  coarseningAlpha?: number;
  /**
   * Carbon content of the liquid pool at which the remaining liquid freezes as eutectic, mass %
   * (bounds the ingot-scale Scheil enrichment; needs carbon among the tracked solutes). Default
   * 4.30 (binary Fe–C); Infinity switches the bound off. Must exceed the melt's carbon.
   */
  eutecticCarbonMassPct?: number;
}

/** IngotParams with every default filled in and validated. */
export interface ResolvedIngotParams {
  geometry: IngotGeometry;
  halfThicknessM: number;
  cells: number;
  pourTempC: number;
  composition: Required<Composition> | null;
  liquidusTempC: number;
  solidusTempC: number;
  /** Wall conductance per unit wall area, W/(m²·K); Infinity for a fixed-temperature wall. */
  wallHeatTransferWPerM2K: number;
  wallSinkTempC: number;
  fixedWall: boolean;
  latentHeatMethod: LatentHeatMethod;
  latentHeatJPerKg: number;
  densityKgPerM3: number;
  heatCapacityJPerKgK: number;
  conductivityWPerMK: number;
  trackedElements: Element[];
  microsegregation: MicrosegregationModel;
  partitionPhase: PrimaryPhase;
  boundaryLayerM: number;
  liquidDiffusivityM2PerS: number;
  reportSolidFraction: number;
  coarseningAlpha: number;
  eutecticCarbonMassPct: number;
}

/** Validates IngotParams and fills in defaults; pushes model warnings into `warnings`. */
export function resolveIngotParams(p: IngotParams, warnings: string[]): ResolvedIngotParams {
  if (p === null || typeof p !== "object") throw new InputError("params", p, "an IngotParams object");
  const geometry = requireOneOf("geometry", p.geometry ?? "slab", ["slab", "cylinder"] as const);
  const halfThicknessM = requireInRange("halfThicknessM", p.halfThicknessM, { min: 1e-3, max: 5 });
  const cells = requireInteger("cells", p.cells ?? INGOT_DEFAULTS.cells, { min: 5, max: 5000 });
  const pourTempC = requireInRange("pourTempC", p.pourTempC, { min: 0, max: 2000 });
  const composition = p.composition === undefined ? null : validateComposition(p.composition);

  let tl = p.liquidusTempC;
  let ts = p.solidusTempC;
  if (tl === undefined || ts === undefined) {
    if (!composition) throw new InputError("composition", p.composition, "a composition, or both liquidusTempC and solidusTempC");
    if (tl === undefined) {
      const r = liquidusTempC(composition);
      tl = r.value;
      warnings.push(...r.warnings);
    }
    if (ts === undefined) {
      const r = solidusTempC(composition, p.partitionPhase ?? "gamma");
      ts = r.value;
      warnings.push(...r.warnings.filter((w) => !warnings.includes(w)));
    }
  }
  requireInRange("liquidusTempC", tl, { min: 0, max: 2000 });
  requireInRange("solidusTempC", ts, { min: 0, max: tl });
  requireInRange("pourTempC", pourTempC, { min: tl, max: 2000 });

  const latentHeatMethod = requireOneOf("latentHeatMethod", p.latentHeatMethod ?? "enthalpy", ["enthalpy", "effective-heat-capacity"] as const);
  const latentHeatJPerKg = requireNonNegative("latentHeatJPerKg", p.latentHeatJPerKg ?? INGOT_DEFAULTS.latentHeatJPerKg);
  if (latentHeatMethod === "effective-heat-capacity" && latentHeatJPerKg > 0 && !(tl > ts)) {
    throw new InputError("solidusTempC", ts, `< liquidusTempC (${tl}) for the effective-heat-capacity method; use the enthalpy method for isothermal freezing`);
  }

  if (latentHeatMethod === "effective-heat-capacity" && latentHeatJPerKg > 0 && tl - ts < 10) {
    warnings.push(`Freezing range ${(tl - ts).toFixed(1)} °C is narrow for the effective-heat-capacity method (latent heat can be skipped in a step); the enthalpy method is more robust.`);
  }
  const wall: IngotWall = p.wall ?? { type: "mould", mould: "sand" };
  let wallHeatTransferWPerM2K: number;
  let wallSinkTempC: number;
  let fixedWall = false;
  if (wall.type === "fixed-temperature") {
    fixedWall = true;
    wallHeatTransferWPerM2K = Infinity;
    wallSinkTempC = requireInRange("wall.tempC", wall.tempC, { min: -50, max: pourTempC });
  } else if (wall.type === "mould") {
    const mould = requireOneOf("wall.mould", wall.mould, ["sand", "metal", "water-cooled"] as const);
    wallHeatTransferWPerM2K = requireInRange("wall.heatTransferWPerM2K", wall.heatTransferWPerM2K ?? MOULD_HEAT_TRANSFER_W_PER_M2K[mould], { min: 0, max: 1e6 });
    wallSinkTempC = requireInRange("wall.mouldTempC", wall.mouldTempC ?? INGOT_DEFAULTS.mouldTempC, { min: -50, max: pourTempC });
  } else {
    throw new InputError("wall.type", (wall as { type: unknown }).type, "one of mould, fixed-temperature");
  }

  const partitionPhase = requireOneOf("partitionPhase", p.partitionPhase ?? "gamma", ["gamma", "delta"] as const);
  const trackedElements = resolveTrackedElements(p.trackedElements, composition);
  const microsegregation = requireOneOf("microsegregation", p.microsegregation ?? "back-diffusion", ["scheil", "back-diffusion", "lever"] as const);
  const boundaryLayerM = p.boundaryLayerM ?? INGOT_DEFAULTS.boundaryLayerM;
  if (boundaryLayerM !== Infinity) requireNonNegative("boundaryLayerM", boundaryLayerM);
  const eutecticCarbonMassPct = p.eutecticCarbonMassPct ?? INGOT_DEFAULTS.eutecticCarbonMassPct;
  if (eutecticCarbonMassPct !== Infinity) requirePositive("eutecticCarbonMassPct", eutecticCarbonMassPct);
  const carbon = composition?.C ?? 0;
  if (carbon >= eutecticCarbonMassPct) {
    throw new InputError("composition.C", carbon, `< eutecticCarbonMassPct (${eutecticCarbonMassPct}): hypo-eutectic steels only (above is the cast-iron range)`);
  }

  return {
    geometry,
    halfThicknessM,
    cells,
    pourTempC,
    composition,
    liquidusTempC: tl,
    solidusTempC: ts,
    wallHeatTransferWPerM2K,
    wallSinkTempC,
    fixedWall,
    latentHeatMethod,
    latentHeatJPerKg,
    densityKgPerM3: requireInRange("densityKgPerM3", p.densityKgPerM3 ?? INGOT_DEFAULTS.densityKgPerM3, { min: 100, max: 30000 }),
    heatCapacityJPerKgK: requireInRange("heatCapacityJPerKgK", p.heatCapacityJPerKgK ?? INGOT_DEFAULTS.heatCapacityJPerKgK, { min: 10, max: 1e4 }),
    conductivityWPerMK: requireInRange("conductivityWPerMK", p.conductivityWPerMK ?? INGOT_DEFAULTS.conductivityWPerMK, { min: 0.01, max: 1000 }),
    trackedElements,
    microsegregation,
    partitionPhase,
    boundaryLayerM,
    liquidDiffusivityM2PerS: requirePositive("liquidDiffusivityM2PerS", p.liquidDiffusivityM2PerS ?? INGOT_DEFAULTS.liquidDiffusivityM2PerS),
    reportSolidFraction: requireInRange("reportSolidFraction", p.reportSolidFraction ?? INGOT_DEFAULTS.reportSolidFraction, {
      min: 0,
      max: 1,
      minExclusive: true,
      maxExclusive: true,
    }),
    coarseningAlpha: requireNonNegative("coarseningAlpha", p.coarseningAlpha ?? 0),
    eutecticCarbonMassPct,
  };
}

function resolveTrackedElements(requested: Element[] | undefined, composition: Required<Composition> | null): Element[] {
  if (requested === undefined) {
    if (!composition) return [];
    return ELEMENTS.filter((el) => composition[el] > 0 && PARTITION_DATA[el] !== undefined);
  }
  if (!Array.isArray(requested)) throw new InputError("trackedElements", requested, "an array of element symbols");
  const out: Element[] = [];
  for (const el of requested) {
    if (!PARTITION_DATA[el]) throw new InputError("trackedElements", el, `an element with partition data (${Object.keys(PARTITION_DATA).join(", ")})`);
    if (!composition || !(composition[el] > 0)) throw new InputError(`composition.${el}`, composition?.[el] ?? 0, "> 0 for a tracked element");
    if (!out.includes(el)) out.push(el);
  }
  return out;
}
