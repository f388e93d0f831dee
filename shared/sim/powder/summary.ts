/** The powder simulation's text for the ARIA live region. Pure. */
import { formatNumber, formatScientific } from "../alloy/format";
import type { PowderClasses } from "./classes";
import { medianClass } from "./comparison";
import type { RouteComparison } from "./comparison";
import type { HipOutcome } from "./hip-model";
import type { ResolvedPowderParams } from "./params";

export function describePowder(params: ResolvedPowderParams, result: PowderClasses, comparison: RouteComparison | null, hip: HipOutcome): string {
  const median = medianClass(result.classes);
  const fine = result.classes[0];
  const coarse = result.classes[result.classes.length - 1];
  const gasName = params.gas === "N2" ? "nitrogen" : "argon";
  const parts = [
    `Melt of ${params.grade} atomised by ${gasName} at ${params.gasVelocityMPerS} m/s: mass-median droplet ${params.medianDiameterUm} µm (spread ${params.geometricStdDev}).`,
    `A median droplet cools at about ${formatScientific(median.coolingRateKPerS)} K/s and is solid ${formatNumber(median.solidAtFallM * 100, 2)} cm below the nozzle;`,
    `the finest (${formatNumber(fine.diameterM * 1e6, 2)} µm) freeze within ${formatNumber(fine.solidAtFallM * 100, 2)} cm, the coarsest (${formatNumber(coarse.diameterM * 1e6, 2)} µm) by ${formatNumber(coarse.solidAtFallM * 100, 2)} cm.`,
  ];
  if (median.armSpacingUm !== null) {
    parts.push(`Dendrite arm spacing ${formatNumber(median.armSpacingUm, 2)} µm, carbides about ${formatNumber(median.carbideSizeUm ?? 0, 2)} µm.`);
  }
  if (comparison?.refinement) {
    parts.push(`That is ${Math.round(comparison.refinement)} times finer than the middle of a 500 mm ingot of the same steel.`);
  }
  parts.push(
    `Pressed at ${params.hipPressureMPa} MPa and ${params.hipTempC} °C the can reaches ${formatNumber(hip.relativeDensity * 100, 3)} % density and shrinks ${formatNumber(hip.linearShrinkage * 100, 3)} % in each direction.`,
  );
  return parts.join(" ");
}
