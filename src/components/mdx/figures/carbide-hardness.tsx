import { Bar, BarChart, CartesianGrid, Cell, ReferenceLine, ResponsiveContainer, XAxis, YAxis } from "recharts";
import { ABRASIVES, CARBIDE_DATA, MARTENSITE_MATRIX_DATA } from "@shared/metallurgy";
import { AXIS_LABEL_STYLE, AXIS_TICK, ChartFrame, FIGURE_COLORS as C } from "./chart-frame";

export default function CarbideHardness() {
  const rows = [
    { name: "Martensite", hv: Math.round((MARTENSITE_MATRIX_DATA.hvRange[0] + MARTENSITE_MATRIX_DATA.hvRange[1]) / 2), color: C.muted },
    ...(["M3C", "M23C6", "M7C3", "M6C", "M2C", "MC"] as const).map((key) => ({ name: CARBIDE_DATA[key].key, hv: CARBIDE_DATA[key].typicalHv, color: key === "MC" ? C.ember : key === "M3C" ? C.bronze : C.quench })),
  ];
  const stones = (["quartz", "aluminium-oxide", "silicon-carbide"] as const).map((k) => ABRASIVES[k]);
  return (
    <ChartFrame
      height={340}
      description={`Typical Vickers hardness: martensite about ${rows[0].hv} HV, iron carbide ${CARBIDE_DATA.M3C.typicalHv}, chromium carbides ${CARBIDE_DATA.M23C6.typicalHv}–${CARBIDE_DATA.M7C3.typicalHv}, tungsten-molybdenum carbides ${CARBIDE_DATA.M6C.typicalHv}–${CARBIDE_DATA.M2C.typicalHv} and vanadium carbide ${CARBIDE_DATA.MC.typicalHv} HV. Dashed lines: quartz ${ABRASIVES.quartz.typicalHv}, aluminium oxide ${ABRASIVES["aluminium-oxide"].typicalHv} and silicon carbide ${ABRASIVES["silicon-carbide"].typicalHv} HV.`}
      note={`Typical values inside wide published ranges. Diamond (about ${ABRASIVES.diamond.typicalHv} HV) is off the scale. An abrasive cuts a phase readily only when it is clearly harder.`}
    >
      <ResponsiveContainer>
        <BarChart data={rows} layout="vertical" margin={{ top: 8, right: 24, bottom: 28, left: 8 }} accessibilityLayer={false}>
          <CartesianGrid stroke={C.grid} horizontal={false} />
          <XAxis type="number" domain={[0, 3000]} ticks={[0, 500, 1000, 1500, 2000, 2500, 3000]} tick={AXIS_TICK} label={{ value: "Hardness, HV", position: "insideBottom", offset: -16, style: AXIS_LABEL_STYLE }} />
          <YAxis type="category" dataKey="name" tick={{ ...AXIS_TICK, fontWeight: 600 }} width={86} />
          <Bar dataKey="hv" isAnimationActive={false} barSize={18} radius={[0, 3, 3, 0]}>
            {rows.map((row) => (
              <Cell key={row.name} fill={row.color} />
            ))}
          </Bar>
          {stones.map((s) => (
            <ReferenceLine key={s.key} x={s.typicalHv} stroke={C.ink} strokeDasharray="4 3" label={{ value: s.name, position: "top", fill: C.ink, fontSize: 10 }} />
          ))}
        </BarChart>
      </ResponsiveContainer>
    </ChartFrame>
  );
}
