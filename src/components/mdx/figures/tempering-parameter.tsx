import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, XAxis, YAxis } from "recharts";
import { equivalentTemperingHours, temperingParameter } from "@shared/metallurgy";
import { AXIS_LABEL_STYLE, AXIS_TICK, ChartFrame, FIGURE_COLORS as C, range } from "./chart-frame";

/** Three tempers a smith might use, each drawn as its line of equal tempering parameter. */
const TEMPERS = [
  { key: "t180", label: "180 °C for 1 h", tempC: 180, hours: 1, color: C.bronze },
  { key: "t200", label: "200 °C for 2 h", tempC: 200, hours: 2, color: C.purple },
  { key: "t230", label: "230 °C for 2 h", tempC: 230, hours: 2, color: C.blue },
];

export default function TemperingParameterFigure() {
  const params = TEMPERS.map((t) => ({ ...t, p: temperingParameter(t.tempC, t.hours).value }));
  const data = range(160, 260, 51).map((tempC) => {
    const row: Record<string, number | null> = { tempC };
    for (const t of params) {
      const hours = equivalentTemperingHours(t.p, tempC).value;
      row[t.key] = hours >= 0.02 && hours <= 200 ? hours : null;
    }
    return row;
  });
  return (
    <ChartFrame
      height={340}
      description={`Lines of equal Hollomon–Jaffe tempering parameter (C = 20, hours): each line shows the hold time at each temperature that tempers as much as the named treatment. For example 200 °C for 2 hours has P = ${params[1].p.toFixed(0)}.`}
      note="Logarithmic time axis. Equal P gives approximately equal tempered hardness; a rule for trading time against temperature, not a recipe."
    >
      <ResponsiveContainer>
        <LineChart data={data} margin={{ top: 12, right: 20, bottom: 28, left: 8 }} accessibilityLayer={false}>
          <CartesianGrid stroke={C.grid} />
          <XAxis dataKey="tempC" type="number" domain={[160, 260]} ticks={[160, 180, 200, 220, 240, 260]} tick={AXIS_TICK} label={{ value: "Tempering temperature, °C", position: "insideBottom", offset: -16, style: AXIS_LABEL_STYLE }} />
          <YAxis type="number" scale="log" domain={[0.02, 200]} ticks={[0.05, 0.25, 1, 4, 16, 64]} allowDataOverflow tick={AXIS_TICK} width={48} label={{ value: "hours", position: "insideTopLeft", dy: -6, style: AXIS_LABEL_STYLE }} />
          <Legend verticalAlign="top" height={28} wrapperStyle={{ fontSize: 12 }} />
          {params.map((t) => (
            <Line key={t.key} dataKey={t.key} name={t.label} stroke={t.color} strokeWidth={2.5} dot={false} isAnimationActive={false} connectNulls={false} />
          ))}
        </LineChart>
      </ResponsiveContainer>
    </ChartFrame>
  );
}
