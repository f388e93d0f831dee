import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, XAxis, YAxis } from "recharts";
import { leverSolidComposition, partitionCoefficient, scheilSolidComposition } from "@shared/metallurgy";
import { AXIS_LABEL_STYLE, AXIS_TICK, ChartFrame, FIGURE_COLORS as C, range } from "./chart-frame";

const ELEMENTS = [
  { key: "C", label: "Carbon", color: C.ember },
  { key: "V", label: "Vanadium", color: C.purple },
  { key: "Cr", label: "Chromium", color: C.quench },
] as const;

export default function ScheilCurve() {
  const k = Object.fromEntries(ELEMENTS.map((e) => [e.key, partitionCoefficient(e.key)])) as Record<(typeof ELEMENTS)[number]["key"], number>;
  const data = range(0, 0.95, 96).map((fs) => {
    const row: Record<string, number> = { fs: Number(fs.toFixed(3)) };
    for (const e of ELEMENTS) row[e.key] = scheilSolidComposition(1, k[e.key], fs);
    row.leverV = leverSolidComposition(1, k.V, fs);
    return row;
  });
  return (
    <ChartFrame
      height={340}
      description={`Solid composition relative to the melt (C_s/C_0) as an austenite ingot freezes, by the Scheil equation: carbon (k = ${k.C}), vanadium (k = ${k.V}) and chromium (k = ${k.Cr}). The first solid is leaner than the melt; the last is much richer. The dashed line is the lever rule for vanadium, with full diffusion in the solid.`}
      note="Relative composition (1 = the melt's). Scheil assumes no diffusion in the solid; carbon diffuses fast enough in reality to even out much of its segregation, vanadium and chromium do not."
    >
      <ResponsiveContainer>
        <LineChart data={data} margin={{ top: 12, right: 20, bottom: 28, left: 8 }} accessibilityLayer={false}>
          <CartesianGrid stroke={C.grid} />
          <XAxis dataKey="fs" type="number" domain={[0, 0.95]} ticks={[0, 0.2, 0.4, 0.6, 0.8, 0.95]} tick={AXIS_TICK} label={{ value: "Fraction solid", position: "insideBottom", offset: -16, style: AXIS_LABEL_STYLE }} />
          <YAxis type="number" domain={[0, 4]} allowDataOverflow tick={AXIS_TICK} width={40} label={{ value: "Cₛ/C₀", position: "insideTopLeft", dy: -6, style: AXIS_LABEL_STYLE }} />
          <Legend verticalAlign="top" height={28} wrapperStyle={{ fontSize: 12 }} />
          {ELEMENTS.map((e) => (
            <Line key={e.key} dataKey={e.key} name={`${e.label} (Scheil)`} stroke={e.color} strokeWidth={2.5} dot={false} isAnimationActive={false} />
          ))}
          <Line dataKey="leverV" name="Vanadium (lever rule)" stroke={C.purple} strokeDasharray="5 4" strokeWidth={1.5} dot={false} isAnimationActive={false} />
        </LineChart>
      </ResponsiveContainer>
    </ChartFrame>
  );
}
