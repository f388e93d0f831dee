import { CartesianGrid, Line, LineChart, ReferenceDot, ResponsiveContainer, XAxis, YAxis } from "recharts";
import { a3TempC, acmTempC, ironCarbonLiquidusTempC, ironCarbonPoints, ironCarbonSolidusTempC } from "@shared/metallurgy";
import { AXIS_LABEL_STYLE, AXIS_TICK, ChartFrame, FIGURE_COLORS as C, range } from "./chart-frame";

const ASM = ironCarbonPoints("asm");
const X_MAX = 2.4;

/** The steel corner of the Fe–Fe3C diagram (ASM key points): liquidus, solidus, A3, Acm and A1. */
function buildData() {
  return range(0, X_MAX, 241).map((c) => ({
    c: Number(c.toFixed(3)),
    liquidus: ironCarbonLiquidusTempC(c),
    solidus: c <= ASM.maxCarbonInAustenite.carbonMassPct ? ironCarbonSolidusTempC(c) : null,
    eutectic: c >= ASM.maxCarbonInAustenite.carbonMassPct ? ASM.eutectic.tempC : null,
    a3: c <= ASM.eutectoid.carbonMassPct ? a3TempC(c) : null,
    acm: c >= ASM.eutectoid.carbonMassPct && c <= ASM.maxCarbonInAustenite.carbonMassPct ? acmTempC(c) : null,
    a1: c >= ASM.maxCarbonInFerrite.carbonMassPct ? ASM.eutectoid.tempC : null,
  }));
}

const labels: { x: number; y: number; text: string }[] = [
  { x: 1.05, y: 1020, text: "γ austenite" },
  { x: 1.55, y: 1370, text: "liquid + γ" },
  { x: 0.5, y: 1500, text: "liquid" },
  { x: 0.28, y: 600, text: "α + Fe₃C (pearlite)" },
  { x: 1.7, y: 800, text: "γ + Fe₃C" },
  { x: 1.65, y: 600, text: "pearlite + Fe₃C" },
];

export default function IronCarbonDiagram() {
  const data = buildData();
  return (
    <ChartFrame
      height={360}
      description={`Iron–carbon diagram from 0 to ${X_MAX} % carbon and 500 to 1600 °C. The A3 line falls from about 910 °C at zero carbon to the eutectoid at ${ASM.eutectoid.carbonMassPct} % C and ${ASM.eutectoid.tempC} °C; the Acm line rises from there to ${ASM.maxCarbonInAustenite.carbonMassPct} % C at ${ASM.maxCarbonInAustenite.tempC} °C. Below ${ASM.eutectoid.tempC} °C austenite turns to ferrite and cementite.`}
      note={`Key points: ASM diagram (eutectoid ${ASM.eutectoid.carbonMassPct} % C, ${ASM.eutectoid.tempC} °C; eutectic ${ASM.eutectic.tempC} °C). A3 and Acm are the approximate lines of the science core (±15 °C).`}
    >
      <ResponsiveContainer>
        <LineChart data={data} margin={{ top: 12, right: 16, bottom: 28, left: 8 }} accessibilityLayer={false}>
          <CartesianGrid stroke={C.grid} />
          <XAxis dataKey="c" type="number" domain={[0, X_MAX]} ticks={[0, 0.4, 0.77, 1.2, 1.6, 2.11]} tick={AXIS_TICK} label={{ value: "Carbon, mass %", position: "insideBottom", offset: -16, style: AXIS_LABEL_STYLE }} />
          <YAxis type="number" domain={[500, 1600]} ticks={[500, 727, 912, 1148, 1400, 1538]} tick={AXIS_TICK} width={52} label={{ value: "°C", position: "insideTopLeft", offset: 0, dy: -6, style: AXIS_LABEL_STYLE }} />
          <Line dataKey="liquidus" stroke={C.ember} strokeWidth={2} dot={false} isAnimationActive={false} name="Liquidus" />
          <Line dataKey="solidus" stroke={C.emberLight} strokeWidth={2} dot={false} isAnimationActive={false} name="Solidus" />
          <Line dataKey="eutectic" stroke={C.emberLight} strokeWidth={2} dot={false} isAnimationActive={false} />
          <Line dataKey="a3" stroke={C.quench} strokeWidth={2.5} dot={false} isAnimationActive={false} name="A3" />
          <Line dataKey="acm" stroke={C.purple} strokeWidth={2.5} dot={false} isAnimationActive={false} name="Acm" />
          <Line dataKey="a1" stroke={C.ink} strokeWidth={1.5} strokeDasharray="5 3" dot={false} isAnimationActive={false} name="A1" />
          <ReferenceDot x={ASM.eutectoid.carbonMassPct} y={ASM.eutectoid.tempC} r={4} fill={C.ink} stroke="white" label={{ value: "eutectoid", position: "bottom", fill: C.ink, fontSize: 11 }} />
          {labels.map((l) => (
            <ReferenceDot key={l.text} x={l.x} y={l.y} r={0} label={{ value: l.text, fill: C.axis, fontSize: 12, fontStyle: "italic" }} />
          ))}
          <ReferenceDot x={0.3} y={a3TempC(0.3)} r={0} label={{ value: "A3", position: "right", fill: C.quench, fontSize: 12, fontWeight: 700 }} />
          <ReferenceDot x={1.45} y={acmTempC(1.45)} r={0} label={{ value: "Acm", position: "left", fill: C.purple, fontSize: 12, fontWeight: 700 }} />
          <ReferenceDot x={2.3} y={ASM.eutectoid.tempC} r={0} label={{ value: "A1", position: "top", fill: C.ink, fontSize: 12, fontWeight: 700 }} />
        </LineChart>
      </ResponsiveContainer>
    </ChartFrame>
  );
}
