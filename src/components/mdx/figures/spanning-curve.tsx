import { useEffect, useState } from "react";
import { CartesianGrid, Legend, Line, LineChart, ReferenceLine, ResponsiveContainer, XAxis, YAxis } from "recharts";
import { chromiumAtomFraction, chromiumMassPctFromAtomFraction, percolationThreshold, spanningProbability } from "@shared/metallurgy";
import { AXIS_LABEL_STYLE, AXIS_TICK, ChartFrame, FIGURE_COLORS as C, range } from "./chart-frame";

/** Small lattices and few samples keep this quick in the browser; the lab's simulation runs the full-size version. */
const SIZE = 16;
const SAMPLES = 24;
const CR_MASS_PCT = range(6, 30, 25);
const MODELS = [
  { key: "bcc", lattice: "bcc" as const, label: "bcc, 1st + 2nd neighbours", color: C.quench },
  { key: "sc", lattice: "sc" as const, label: "simple cubic, 1st + 2nd neighbours", color: C.ember },
];

type Row = { cr: number } & Partial<Record<(typeof MODELS)[number]["key"], number>>;

export default function SpanningCurve() {
  const [rows, setRows] = useState<Row[]>(() => CR_MASS_PCT.map((cr) => ({ cr })));
  const [done, setDone] = useState(0);
  const total = CR_MASS_PCT.length * MODELS.length;

  // One point per task, so the page stays responsive while the Monte-Carlo runs.
  useEffect(() => {
    let cancelled = false;
    let index = 0;
    const next = () => {
      if (cancelled || index >= total) return;
      const model = MODELS[Math.floor(index / CR_MASS_PCT.length)];
      const i = index % CR_MASS_PCT.length;
      const { probability } = spanningProbability({ lattice: model.lattice, neighbours: 2, size: SIZE, crAtomFraction: chromiumAtomFraction(CR_MASS_PCT[i]), samples: SAMPLES, seed: 7 + i });
      setRows((old) => old.map((row, j) => (j === i ? { ...row, [model.key]: probability } : row)));
      index += 1;
      setDone(index);
      setTimeout(next, 0);
    };
    const timer = setTimeout(next, 50);
    return () => {
      cancelled = true;
      clearTimeout(timer);
    };
  }, [total]);

  const thresholds = MODELS.map((m) => ({ ...m, wt: chromiumMassPctFromAtomFraction(percolationThreshold(m.lattice, 2)?.pc ?? 0) }));
  return (
    <ChartFrame
      height={340}
      description={`Chance that chromium atoms form a connected path across a small random Fe–Cr lattice, against chromium content. For bcc with first and second neighbours the chance rises steeply around ${thresholds[0].wt.toFixed(1)} % Cr; for simple cubic with first and second neighbours around ${thresholds[1].wt.toFixed(1)} % Cr.`}
      note={
        <>
          Monte-Carlo on a {SIZE}³ lattice, {SAMPLES} samples per point{done < total ? ` — computing ${done} of ${total}…` : ""}. Dashed: published percolation thresholds for large lattices. Two model choices, not
          settled fact; practice puts the stainless threshold at about 11–13 % Cr.
        </>
      }
    >
      <ResponsiveContainer>
        <LineChart data={rows} margin={{ top: 12, right: 20, bottom: 28, left: 8 }} accessibilityLayer={false}>
          <CartesianGrid stroke={C.grid} />
          <XAxis dataKey="cr" type="number" domain={[6, 30]} ticks={[6, 10.5, 13, 16.5, 20, 25, 30]} tick={AXIS_TICK} label={{ value: "Chromium, mass %", position: "insideBottom", offset: -16, style: AXIS_LABEL_STYLE }} />
          <YAxis type="number" domain={[0, 1]} ticks={[0, 0.25, 0.5, 0.75, 1]} tick={AXIS_TICK} width={40} label={{ value: "P(span)", position: "insideTopLeft", dy: -6, style: AXIS_LABEL_STYLE }} />
          <Legend verticalAlign="top" height={28} wrapperStyle={{ fontSize: 12 }} />
          {thresholds.map((t) => (
            <ReferenceLine key={t.key} x={t.wt} stroke={t.color} strokeDasharray="4 3" />
          ))}
          {MODELS.map((m) => (
            <Line key={m.key} dataKey={m.key} name={m.label} stroke={m.color} strokeWidth={2.5} dot={{ r: 2 }} isAnimationActive={false} connectNulls />
          ))}
        </LineChart>
      </ResponsiveContainer>
    </ChartFrame>
  );
}
