import { CartesianGrid, Line, LineChart, ReferenceArea, ReferenceLine, ResponsiveContainer, XAxis, YAxis } from "recharts";
import type { SpanningCurveForModel } from "@shared/sim/passive-film";

interface SpanningChartProps {
  curve: SpanningCurveForModel | null;
  progress: number | null;
  error: string | null;
  /** Bulk Cr and free Cr of the current alloy, mass %. */
  crMassPct: number;
  freeCrMassPct: number;
  /** Literature bulk threshold of the chosen lattice in wt% Cr, if tabulated. */
  literatureThresholdMassPct: number | null;
  modelLabel: string;
}

/** Where the curve crosses one half: a readable "threshold" of the finite sample. */
export function halfCrossing(curve: SpanningCurveForModel): number | null {
  const pts = curve.points;
  for (let i = 1; i < pts.length; i++) {
    const a = pts[i - 1], b = pts[i];
    if (a.probability < 0.5 && b.probability >= 0.5) {
      return a.crMassPct + ((0.5 - a.probability) / (b.probability - a.probability)) * (b.crMassPct - a.crMassPct);
    }
  }
  return null;
}

export function SpanningChart({ curve, progress, error, crMassPct, freeCrMassPct, literatureThresholdMassPct, modelLabel }: SpanningChartProps) {
  const half = curve ? halfCrossing(curve) : null;
  return (
    <figure className="rounded-md border border-bone-300 bg-white p-3">
      <figcaption className="text-sm font-semibold text-soot-900">
        Chance that chromium connects across the sample — {modelLabel}
      </figcaption>
      {error ? <p role="alert" className="mt-2 text-sm text-danger-700">{error}</p> : null}
      {progress !== null ? (
        <div className="mt-3">
          <label className="text-sm text-soot-700" htmlFor="spanning-progress">
            Computing random lattices… {Math.round(progress * 100)} %
          </label>
          <progress id="spanning-progress" max={1} value={progress} className="mt-1 block h-2 w-full accent-ember-600" />
        </div>
      ) : null}
      {curve ? (
        <>
          <p className="mt-1 text-xs text-soot-600">
            Each point: {curve.samples} random {curve.geometry} lattices. Solid line: the model. Marks: this alloy&apos;s Cr
            (▲ bulk, ● free after carbides), the EN 10088-1 definition (10.5 %, dotted), the 12–13 % practical band
            (common practice, shaded){literatureThresholdMassPct !== null ? ", and the literature bulk threshold (dashed)" : ""}.
          </p>
          <div className="mt-2 h-56" aria-hidden="true">
            <ResponsiveContainer width="100%" height="100%">
              <LineChart data={curve.points} margin={{ top: 16, right: 12, bottom: 4, left: 0 }} accessibilityLayer={false}>
                <CartesianGrid stroke="#ebe3d5" />
                <XAxis dataKey="crMassPct" type="number" domain={[0, 30]} ticks={[0, 5, 10, 15, 20, 25, 30]} unit=" %" tick={{ fontSize: 11, fill: "#38322c" }} />
                <YAxis domain={[0, 1]} ticks={[0, 0.25, 0.5, 0.75, 1]} tick={{ fontSize: 11, fill: "#38322c" }} width={40} />
                <ReferenceArea x1={12} x2={13} fill="#e3c26b" fillOpacity={0.45} label={{ value: "12–13 %", position: "insideTop", fontSize: 10, fill: "#38322c" }} />
                <ReferenceLine x={10.5} stroke="#38322c" strokeDasharray="2 3" strokeWidth={1.5} label={{ value: "10.5 %", position: "insideLeft", fontSize: 10, fill: "#38322c" }} />
                {literatureThresholdMassPct !== null ? (
                  <ReferenceLine x={literatureThresholdMassPct} stroke="#7d4f8f" strokeDasharray="7 4" strokeWidth={1.5} />
                ) : null}
                <Line dataKey="probability" stroke="#214c69" strokeWidth={2.5} dot={{ r: 2.5, fill: "#214c69" }} isAnimationActive={false} />
                <ReferenceLine x={crMassPct} stroke="#9a3e08" strokeWidth={2} label={{ value: "▲", position: "bottom", fontSize: 12, fill: "#9a3e08" }} />
                <ReferenceLine x={freeCrMassPct} stroke="#9a3e08" strokeWidth={1} label={{ value: "●", position: "top", fontSize: 12, fill: "#9a3e08" }} />
              </LineChart>
            </ResponsiveContainer>
          </div>
          <p className="mt-2 text-sm text-soot-800">
            {half !== null
              ? `In this model the chance of a connected network passes one half at about ${half.toFixed(1)} % Cr.`
              : "In this model chromium never connects across the sample below 30 % Cr."}{" "}
            This alloy has {freeCrMassPct.toFixed(1)} % free Cr. Which neighbour shells really count for passivity is an open
            question: different choices move the threshold by several per cent.
          </p>
        </>
      ) : null}
    </figure>
  );
}
