/**
 * The ingot simulation's text summary for the ARIA live region: what the canvas shows at the
 * current model time, and after freezing, what the section ended with. Pure.
 */
import { formatDuration, formatMassPct } from "../alloy/format";
import type { IngotFrameView, Fronts } from "./frames";
import type { IngotElement } from "./params";
import type { IngotRun } from "./run";

export function describeIngotFrame(run: IngotRun, frame: IngotFrameView, fronts: Fronts, element: IngotElement): string {
  const t = formatDuration(frame.timeS);
  const sizeMm = run.sim.sizeMm;
  if (fronts.sectionSolidFraction >= 0.9999 || frame.timeS >= run.totalTimeS) return describeIngotResult(run, element);
  const shellMm = Math.round(fronts.solidusFrontM * 1000);
  const mushyMm = Math.max(0, Math.round((fronts.liquidusFrontM - fronts.solidusFrontM) * 1000));
  const centreC = Math.round(frame.tempC[frame.tempC.length - 1]);
  const pct = Math.round(fronts.sectionSolidFraction * 100);
  const parts = [
    `At ${t} the ${sizeMm} mm ingot is ${pct} % solid: a fully solid shell ${shellMm} mm thick, a mushy zone ${mushyMm} mm wide, and the centre at ${centreC} °C.`,
  ];
  if (frame.poolMassPct !== null) {
    const nominal = run.nominalMassPct[element] ?? 0;
    const ratio = nominal > 0 ? frame.poolMassPct / nominal : 1;
    if (fronts.sectionSolidFraction < 0.999) {
      parts.push(`The remaining liquid holds ${formatMassPct(frame.poolMassPct)} ${element}, ${ratio.toFixed(2)} times the melt's ${formatMassPct(nominal)}.`);
    }
  } else {
    parts.push(`This alloy has no ${element} to map.`);
  }
  return parts.join(" ");
}

export function describeIngotResult(run: IngotRun, element: IngotElement): string {
  const n = run.cells;
  const parts = [`The ${run.sim.sizeMm} mm ingot was fully solid after ${formatDuration(run.totalTimeS)} of model time.`];
  const mean = run.final.meanMassPct[element];
  if (mean) {
    // The centre node takes all solute left in the last liquid; quote the node beside it.
    const nearCentre = mean[n - 2];
    parts.push(`${element} runs from ${formatMassPct(mean[0])} at the wall to ${formatMassPct(nearCentre)} near the centre (melt ${formatMassPct(run.nominalMassPct[element] ?? 0)}).`);
  } else {
    parts.push(`This alloy has no ${element}.`);
  }
  const firstRisk = run.final.carbideRisk.findIndex((r) => r !== "none");
  if (firstRisk >= 0) {
    const fromMm = Math.round(run.positionM[firstRisk] * 1000);
    parts.push(`Coarse primary carbides are likely from ${fromMm} mm below the surface to the centre.`);
  } else {
    parts.push("No coarse primary carbides are expected by the last-liquid rule.");
  }
  return parts.join(" ");
}
