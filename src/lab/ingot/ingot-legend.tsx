import type { IngotElement } from "@shared/sim/ingot/params";
import type { IngotRun } from "@shared/sim/ingot/run";
import { Legend } from "@/lab/shared-ui/legend";
import { glowGradient, segregationGradient } from "@/lab/shared-ui/incandescence";

/** Colour scales and the key to the marks on the ingot section. */
export function IngotLegend({ run, element }: { run: IngotRun | null; element: IngotElement }) {
  const minC = 20;
  const maxC = run ? Math.max(1550, run.pourTempC) : 1550;
  const pos = (t: number) => `${(100 * (t - minC)) / (maxC - minC)}%`;
  return (
    <div className="grid gap-4 rounded-md border border-bone-300 bg-white p-3 @xl:grid-cols-2">
      <div>
        <p className="eyebrow text-[0.65rem] text-soot-600">Left half: temperature</p>
        <div className="relative mt-1.5 h-4 rounded-xs border border-soot-700/40" style={{ background: glowGradient(minC, maxC) }} aria-hidden="true">
          {run ? (
            <>
              <span className="absolute -top-1 h-6 w-0.5 bg-quench-700" style={{ left: pos(run.solidusC) }} />
              <span className="absolute -top-1 h-6 w-0.5 bg-soot-950" style={{ left: pos(run.liquidusC) }} />
            </>
          ) : null}
        </div>
        <p className="mt-1 flex justify-between font-mono text-xs text-soot-700">
          <span>{minC} °C</span>
          <span>{maxC} °C</span>
        </p>
        {run ? (
          <p className="text-xs text-soot-700">
            Marks: solidus {Math.round(run.solidusC)} °C (blue), liquidus {Math.round(run.liquidusC)} °C (black).
          </p>
        ) : null}
      </div>
      <div>
        <p className="eyebrow text-[0.65rem] text-soot-600">Right half: {element} relative to the melt</p>
        <div className="mt-1.5 h-4 rounded-xs border border-soot-700/40" style={{ background: segregationGradient() }} aria-hidden="true" />
        <p className="mt-1 flex justify-between font-mono text-xs text-soot-700">
          <span>≤ 0.5× (depleted)</span>
          <span>1×</span>
          <span>≥ 2× (enriched)</span>
        </p>
      </div>
      <div className="@xl:col-span-2">
        <Legend
          title="Marks"
          columns={2}
          items={[
            { key: "mushy", label: "Mushy zone", detail: "solid dendrites and liquid between liquidus and solidus", swatch: { fill: "#ebe3d5", pattern: "hatch", patternColor: "#1a1714", stroke: "#524a43" } },
            { key: "solidus", label: "Solidus front", detail: "fully solid from here to the wall", swatch: { fill: "#1a1714", shape: "line" } },
            { key: "liquidus", label: "Liquidus front", detail: "all liquid inside this line", swatch: { fill: "#1a1714", shape: "line", dashed: true } },
            { key: "carbide", label: "Coarse primary carbides", detail: "where the last liquid passes the carbide thresholds", swatch: { fill: "#0f0d0b", shape: "diamond", stroke: "#97bfd9" } },
          ]}
        />
      </div>
    </div>
  );
}
