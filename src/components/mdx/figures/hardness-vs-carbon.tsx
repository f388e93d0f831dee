import { CartesianGrid, Line, LineChart, ReferenceArea, ReferenceDot, ResponsiveContainer, XAxis, YAxis } from "recharts";
import { martensiteHardnessHrc } from "@shared/metallurgy";
import { AXIS_LABEL_STYLE, AXIS_TICK, ChartFrame, FIGURE_COLORS as C, range } from "./chart-frame";

const MARKED = [
  { label: "1080", c: 0.8 },
  { label: "5160", c: 0.6 },
  { label: "1095", c: 0.95 },
];

export default function HardnessVsCarbon() {
  const data = range(0.1, 1.0, 91).map((c) => ({ c: Number(c.toFixed(2)), hrc: martensiteHardnessHrc(c) }));
  const at = (c: number) => martensiteHardnessHrc(c);
  return (
    <ChartFrame
      description={`As-quenched martensite hardness rises steeply with dissolved carbon, from about ${at(0.1).toFixed(0)} HRC at 0.1 % C to ${at(0.6).toFixed(0)} HRC at 0.6 % C, then levels off near ${at(1.0).toFixed(0)} HRC at 1 % C.`}
      note="Carbon dissolved in austenite before the quench, not the steel's total carbon. Shaded: above 0.7 % C the model is outside its calibration range."
    >
      <ResponsiveContainer>
        <LineChart data={data} margin={{ top: 12, right: 20, bottom: 28, left: 8 }} accessibilityLayer={false}>
          <CartesianGrid stroke={C.grid} />
          <ReferenceArea x1={0.7} x2={1.0} fill={C.bronze} fillOpacity={0.08} />
          <XAxis dataKey="c" type="number" domain={[0.1, 1.0]} ticks={[0.1, 0.2, 0.4, 0.6, 0.8, 1.0]} tick={AXIS_TICK} label={{ value: "Carbon in solution, mass %", position: "insideBottom", offset: -16, style: AXIS_LABEL_STYLE }} />
          <YAxis type="number" domain={[30, 70]} tick={AXIS_TICK} width={44} label={{ value: "HRC", position: "insideTopLeft", dy: -6, style: AXIS_LABEL_STYLE }} />
          <Line dataKey="hrc" stroke={C.ember} strokeWidth={2.5} dot={false} isAnimationActive={false} />
          {MARKED.map((m) => (
            <ReferenceDot key={m.label} x={m.c} y={at(m.c)} r={4} fill={C.quench} stroke="white" label={{ value: m.label, position: "bottom", fill: C.quench, fontSize: 11, fontWeight: 700 }} />
          ))}
        </LineChart>
      </ResponsiveContainer>
    </ChartFrame>
  );
}
