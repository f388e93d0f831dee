import { CARBIDE_DATA } from "../../metallurgy";
import { currentEdgeMetrics, type CarbideSimState } from "./state";

const STONE_NAME = { alumina: "aluminium oxide", "silicon-carbide": "silicon carbide", diamond: "diamond" } as const;

export const INDEX_DISCLAIMER = "model index, not a lifetime";

/** A plain-language description of what the carbide simulation shows, for the ARIA live region. */
export function describeCarbides(state: CarbideSimState): string {
  const { alloy, population: pop, indices, reference, params } = state;
  const parts: string[] = [];
  const stateText = params.state === "hardened" ? `hardened from ${alloy.austenitizingTempC} °C` : "annealed";
  parts.push(`${alloy.label}, ${stateText}.`);
  const present = pop.phases.filter((p) => p.volumePct > 0.05);
  parts.push(
    present.length === 0
      ? "No carbides remain: all carbon is in solution."
      : `Carbides: ${present.map((p) => `${p.type} ${p.volumePct.toFixed(1)} vol%`).join(", ")} (total ${pop.totalCarbideVolumePct.toFixed(1)} %).`,
  );
  parts.push(
    pop.matrixHrc !== null
      ? `Martensite matrix about ${pop.matrixHrc.toFixed(0)} HRC (${pop.matrixHv.toFixed(0)} HV) with ${pop.carbonInSolutionMassPct.toFixed(2)} % C in solution.`
      : `Annealed matrix about ${pop.matrixHv.toFixed(0)} HV.`,
  );
  if (params.view === "field") {
    const drawn = Object.values(state.visible.areaFraction).reduce((s, f) => s + (f ?? 0), 0);
    const biggest = present.length ? present.reduce((a, b) => (b.volumePct > a.volumePct ? b : a)) : null;
    parts.push(
      `Field ${state.base.widthUm.toFixed(0)} µm wide: ${state.visible.count} particles drawn, covering ${(drawn * 100).toFixed(1)} % of the area, after ${state.hours.toFixed(1)} h at temperature.`,
    );
    if (biggest) parts.push(`Largest share: ${CARBIDE_DATA[biggest.type].formula}, about ${CARBIDE_DATA[biggest.type].typicalHv} HV.`);
  }
  const m = currentEdgeMetrics(state);
  if (params.view === "edge" && m && state.edge) {
    parts.push(
      `Edge after ${state.edge.cycles} cutting cycles in quartz-loaded stock: tip worn back ${m.apexRecessionUm.toFixed(1)} µm, ${m.tipWidthUm.toFixed(1)} µm wide 3 µm below the tip` +
        (m.carbideProtrusionUm > 0.2 ? `; carbides stand about ${m.carbideProtrusionUm.toFixed(1)} µm proud of the matrix.` : "."),
    );
  }
  if (params.view === "sharpen" && m && state.edge) {
    parts.push(
      m.sharp
        ? `Restored on ${STONE_NAME[params.abrasive]} after ${state.edge.strokes} model strokes.`
        : `Sharpening on ${STONE_NAME[params.abrasive]}: ${state.edge.strokes} model strokes so far, edge ${m.tipWidthUm.toFixed(1)} µm wide 3 µm below the tip.`,
    );
  }
  parts.push(
    `Edge-retention index ${indices.edgeRetention.toFixed(2)} and sharpening-effort index ${indices.sharpeningEffort.toFixed(2)} on ${STONE_NAME[params.abrasive]} (model indices, not lifetimes; plain-carbon ${reference.label}: ${reference.edgeRetention.toFixed(2)} and ${reference.sharpeningEffort.toFixed(2)}).`,
  );
  return parts.join(" ");
}
