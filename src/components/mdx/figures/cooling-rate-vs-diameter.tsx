import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, XAxis, YAxis } from "recharts";
import { dropletCooling } from "@shared/metallurgy";
import { AXIS_LABEL_STYLE, AXIS_TICK, ChartFrame, FIGURE_COLORS as C } from "./chart-frame";

/** Conditions for the figure: a steel droplet just above freezing in room-temperature gas. */
const DROPLET_TEMP_K = 1800;
const GAS_TEMP_K = 300;
const VELOCITY_M_PER_S = 50;

export default function CoolingRateVsDiameter() {
  const diametersUm = Array.from({ length: 41 }, (_, i) => 10 * 30 ** (i / 40)); // 10–300 µm, log-spaced
  const rate = (gas: "N2" | "Ar", dUm: number) =>
    dropletCooling({ gas, diameterM: dUm * 1e-6, relativeVelocityMPerS: VELOCITY_M_PER_S, dropletTempK: DROPLET_TEMP_K, gasTempK: GAS_TEMP_K }).coolingRateKPerS;
  const data = diametersUm.map((d) => ({ d: Number(d.toFixed(1)), N2: rate("N2", d), Ar: rate("Ar", d) }));
  const at = (d: number) => rate("N2", d);
  return (
    <ChartFrame
      height={340}
      description={`Cooling rate of a steel droplet in gas against its diameter, log–log: in nitrogen about ${at(20).toExponential(1)} K/s at 20 µm, ${at(100).toExponential(1)} K/s at 100 µm and ${at(300).toExponential(1)} K/s at 300 µm; argon cools a little more slowly.`}
      note={`Droplet at ${DROPLET_TEMP_K} K in gas at ${GAS_TEMP_K} K, ${VELOCITY_M_PER_S} m/s relative speed; convection by the Ranz–Marshall correlation. Smaller droplets cool far faster, which is why powder carbides stay fine.`}
    >
      <ResponsiveContainer>
        <LineChart data={data} margin={{ top: 12, right: 20, bottom: 28, left: 16 }} accessibilityLayer={false}>
          <CartesianGrid stroke={C.grid} />
          <XAxis dataKey="d" type="number" scale="log" domain={[10, 300]} ticks={[10, 20, 50, 100, 200, 300]} tick={AXIS_TICK} label={{ value: "Droplet diameter, µm", position: "insideBottom", offset: -16, style: AXIS_LABEL_STYLE }} />
          <YAxis type="number" scale="log" domain={["auto", "auto"]} tick={AXIS_TICK} width={56} tickFormatter={(v: number) => v.toExponential(0)} label={{ value: "K/s", position: "insideTopLeft", dy: -6, style: AXIS_LABEL_STYLE }} />
          <Legend verticalAlign="top" height={28} wrapperStyle={{ fontSize: 12 }} />
          <Line dataKey="N2" name="Nitrogen" stroke={C.quench} strokeWidth={2.5} dot={false} isAnimationActive={false} />
          <Line dataKey="Ar" name="Argon" stroke={C.ember} strokeWidth={2.5} strokeDasharray="6 3" dot={false} isAnimationActive={false} />
        </LineChart>
      </ResponsiveContainer>
    </ChartFrame>
  );
}
