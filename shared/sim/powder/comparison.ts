/**
 * The same composition made two ways: a conventional ingot (the core's solver through the
 * ingot simulation's runner) and gas-atomised powder (the size classes). Reports carbide size
 * and spread, segregation, and the consequences in words. Pure.
 */
import type { Composition } from "../../metallurgy/composition";
import { runIngot, type IngotRun } from "../ingot/run";
import type { ResolvedIngotSimParams } from "../ingot/params";
import type { ClassResult } from "./classes";

/** The reference ingot: 500 mm round in a cast-iron ingot mould, partly mixed liquid [App]. */
export const REFERENCE_INGOT = { sizeMm: 500, mould: "metal" as const, mixing: 0.5 };
const REFERENCE_CELLS = 40;

export interface RouteFigures {
  coolingRateKPerS: number;
  armSpacingUm: number | null;
  /** Typical and largest coarse carbide size, µm (null where none is expected/defined). */
  carbideSizeUm: number | null;
  carbideSizeMaxUm: number | null;
  /** Last liquid V and C at 95 % solid, mass %. */
  lastLiquidV: number | null;
  lastLiquidC: number | null;
  /** Spread of V across the product (max/min of the mean composition), dimensionless. */
  macroSpreadV: number | null;
}

export interface RouteComparison {
  ingot: RouteFigures;
  powder: RouteFigures;
  /** Ingot λ2 / powder λ2 (how much finer the powder's structure is). */
  refinement: number | null;
  ingotRun: IngotRun;
}

export function referenceIngot(composition: Composition): IngotRun {
  const sim: ResolvedIngotSimParams = { composition, gradeId: null, element: "V", ...REFERENCE_INGOT };
  return runIngot(sim, REFERENCE_CELLS);
}

export function compareRoutes(composition: Composition, classes: readonly ClassResult[], ingotRun = referenceIngot(composition)): RouteComparison {
  const n = ingotRun.cells;
  const mid = Math.floor(n / 2);
  const f = ingotRun.final;
  const sizes = Array.from(f.carbideSizeUm).filter((s) => s > 0);
  const meanV = f.meanMassPct.V;
  const ingot: RouteFigures = {
    coolingRateKPerS: f.coolingRateCPerS[mid],
    armSpacingUm: f.armSpacingUm[mid] || null,
    carbideSizeUm: f.armSpacingUm[mid] ? 0.3 * f.armSpacingUm[mid] : null,
    carbideSizeMaxUm: sizes.length ? Math.max(...sizes) : f.armSpacingUm[n - 2] ? 0.3 * f.armSpacingUm[n - 2] : null,
    lastLiquidV: f.lastLiquidMassPct.V?.[mid] ?? null,
    lastLiquidC: f.lastLiquidMassPct.C?.[mid] ?? null,
    // The centre node collects the last liquid's solute; the spread is taken wall to next-to-centre.
    macroSpreadV: meanV ? Math.max(...Array.from(meanV).slice(0, n - 1)) / Math.min(...Array.from(meanV).slice(0, n - 1)) : null,
  };
  const median = medianClass(classes);
  const carbideSizes = classes.map((c) => c.carbideSizeUm).filter((s): s is number => s !== null);
  const powder: RouteFigures = {
    coolingRateKPerS: median.coolingRateKPerS,
    armSpacingUm: median.armSpacingUm,
    carbideSizeUm: median.carbideSizeUm,
    carbideSizeMaxUm: carbideSizes.length ? Math.max(...carbideSizes) : null,
    lastLiquidV: median.lastLiquidMassPct.V ?? null,
    lastLiquidC: median.lastLiquidMassPct.C ?? null,
    // Every droplet is the melt's composition: no segregation from particle to particle.
    macroSpreadV: (composition.V ?? 0) > 0 ? 1 : null,
  };
  const refinement = ingot.armSpacingUm && powder.armSpacingUm ? ingot.armSpacingUm / powder.armSpacingUm : null;
  return { ingot, powder, refinement, ingotRun };
}

/** The class holding the mass median. */
export function medianClass(classes: readonly ClassResult[]): ClassResult {
  let cumulative = 0;
  for (const c of classes) {
    cumulative += c.massFraction;
    if (cumulative >= 0.5) return c;
  }
  return classes[classes.length - 1];
}
