import type { CarbideSimState, EdgeMetrics, StoneId } from "@shared/sim/carbides";

interface CarbideStatsProps {
  sim: CarbideSimState;
  edge: EdgeMetrics | null;
  restore: Record<StoneId, number | null> | null;
}

const STONE_LABEL: Record<StoneId, string> = { alumina: "Aluminium oxide", "silicon-carbide": "Silicon carbide", diamond: "Diamond" };

/** Key numbers under the canvas; every index says it is a model index. */
export function CarbideStats({ sim, edge, restore }: CarbideStatsProps) {
  const pop = sim.population;
  const items: [string, string][] = [
    ["Carbides", `${pop.totalCarbideVolumePct.toFixed(1)} vol %`],
    ["Matrix", pop.matrixHrc !== null ? `${pop.matrixHrc.toFixed(0)} HRC` : `${pop.matrixHv.toFixed(0)} HV`],
    ["Edge retention (model index)", sim.indices.edgeRetention.toFixed(2)],
    ["Sharpening effort (model index)", sim.indices.sharpeningEffort.toFixed(2)],
  ];
  const view = sim.params.view;
  if (view === "field") items.push(["Particles drawn", String(sim.visible.count)], ["Time at temperature", `${sim.hours.toFixed(1)} h`]);
  if (view === "edge" && edge && sim.edge) {
    items.push(["Cutting cycles", `${sim.edge.cycles} (model)`], ["Tip worn back", `${edge.apexRecessionUm.toFixed(1)} µm`], ["Width 3 µm below tip", `${edge.tipWidthUm.toFixed(1)} µm`], ["Carbides proud by", `${Math.max(0, edge.carbideProtrusionUm).toFixed(1)} µm`]);
  }
  if (view === "sharpen" && edge && sim.edge) {
    items.push(["Strokes so far", `${sim.edge.strokes} (model)`], ["Width 3 µm below tip", `${edge.tipWidthUm.toFixed(1)} µm`]);
  }
  return (
    <div className="space-y-3">
      <dl className="grid grid-cols-2 gap-2 @xl:grid-cols-3">
        {items.map(([label, value]) => (
          <div key={label} className="rounded-sm border border-bone-300 bg-white px-3 py-2">
            <dt className="text-xs text-soot-600">{label}</dt>
            <dd className="font-mono text-sm font-semibold tabular-nums text-soot-900 @md:text-base">{value}</dd>
          </div>
        ))}
      </dl>
      {view === "sharpen" ? (
        <div className="rounded-sm border border-bone-300 bg-white px-3 py-2 text-sm">
          <p className="font-semibold text-soot-900">Model strokes to restore this worn edge, by stone</p>
          {restore ? (
            <ul className="mt-1 grid gap-x-4 @md:grid-cols-3">
              {(Object.keys(STONE_LABEL) as StoneId[]).map((s) => (
                <li key={s} className={s === sim.params.abrasive ? "font-bold text-ember-800" : "text-soot-800"}>
                  {STONE_LABEL[s]}: <span className="font-mono">{restore[s] ?? "over 6000"}</span>
                </li>
              ))}
            </ul>
          ) : (
            <p className="text-soot-600">Counting…</p>
          )}
          <p className="mt-1 text-xs text-soot-600">Model counts on a 20 µm section, not a time you will measure at the bench.</p>
        </div>
      ) : null}
    </div>
  );
}
