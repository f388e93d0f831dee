import { useMemo } from "react";
import { Bar, BarChart, CartesianGrid, Line, LineChart, ReferenceDot, ReferenceLine, ResponsiveContainer, Scatter, ScatterChart, XAxis, YAxis, ZAxis } from "recharts";
import { countMedianDiameterM, sauterMeanDiameterM } from "@shared/metallurgy/powder/lognormal";
import { dropletCooling } from "@shared/metallurgy/powder/droplet-cooling";
import { GAS_TEMP_K, MELT_STREAM_SPEED_M_PER_S, type PowderClasses } from "@shared/sim/powder/classes";
import { HIP_CURVE_TEMPS_C, hipCurves, type HipOutcome } from "@shared/sim/powder/hip-model";
import type { PowderRunInputs } from "./worker-protocol";
import { formatNumber, formatScientific } from "@shared/sim/alloy/format";
import { AXIS_TICK, ChartFigure, decadeLabel, decadeTicks, GRID_STROKE } from "@/lab/shared-ui/chart-figure";

/** Mass fraction per size class (the log-normal distribution of the core). */
export function SizeHistogram({ result, inputs }: { result: PowderClasses; inputs: PowderRunInputs }) {
  const data = result.classes.map((c) => ({ label: formatNumber(c.diameterM * 1e6, 2), mass: c.massFraction * 100 }));
  const d50 = inputs.medianDiameterUm * 1e-6;
  const countMedian = countMedianDiameterM(d50, inputs.geometricStdDev) * 1e6;
  const sauter = sauterMeanDiameterM(d50, inputs.geometricStdDev) * 1e6;
  const biggest = data.reduce((a, b) => (b.mass > a.mass ? b : a), data[0]);
  return (
    <ChartFigure
      title="Droplet size distribution (log-normal, by mass)"
      description={
        <>
          Mass of powder in each size class, per cent; classes are equal steps on a log scale. Mass median {inputs.medianDiameterUm} µm,
          geometric spread σg = {inputs.geometricStdDev}; by count the median is only {formatNumber(countMedian, 2)} µm (many small droplets
          carry little mass); Sauter mean {formatNumber(sauter, 3)} µm. The tallest bar is the {biggest?.label} µm class with{" "}
          {formatNumber(biggest?.mass ?? 0, 2)} %.
        </>
      }
    >
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={data} margin={{ top: 8, right: 8, bottom: 16, left: 0 }} accessibilityLayer={false}>
          <CartesianGrid stroke={GRID_STROKE} vertical={false} />
          <XAxis dataKey="label" tick={AXIS_TICK} interval="preserveStartEnd" label={{ value: "droplet diameter, µm", position: "insideBottom", offset: -10, fontSize: 11, fill: "#38322c" }} />
          <YAxis tick={AXIS_TICK} width={36} unit="%" />
          <Bar dataKey="mass" fill="#c2500b" stroke="#72300b" isAnimationActive={false} />
        </BarChart>
      </ResponsiveContainer>
    </ChartFigure>
  );
}

/** Cooling rate against droplet diameter on log–log axes: the Ranz–Marshall curve and the flight classes. */
export function CoolingRateChart({ result, inputs }: { result: PowderClasses; inputs: PowderRunInputs }) {
  const curve = useMemo(() => {
    const rows: { d: number; rate: number }[] = [];
    const liquidusK = result.liquidusC + 273.15;
    for (let k = 0; k <= 40; k++) {
      const d = 5e-6 * (1000 / 5) ** (k / 40);
      const r = dropletCooling({
        gas: inputs.gas,
        diameterM: d,
        relativeVelocityMPerS: Math.abs(inputs.gasVelocityMPerS - MELT_STREAM_SPEED_M_PER_S),
        dropletTempK: liquidusK,
        gasTempK: GAS_TEMP_K,
        freezingTempK: liquidusK,
      });
      rows.push({ d: d * 1e6, rate: r.coolingRateKPerS });
    }
    return rows;
  }, [result.liquidusC, inputs.gas, inputs.gasVelocityMPerS]);
  const points = result.classes.map((c) => ({ d: c.diameterM * 1e6, rate: c.coolingRateKPerS }));
  const all = [...curve.map((r) => r.rate), ...points.map((p) => p.rate)];
  const yTicks = decadeTicks(Math.min(...all), Math.max(...all));
  const first = result.classes[0];
  const last = result.classes[result.classes.length - 1];
  return (
    <ChartFigure
      title="Cooling rate against droplet diameter"
      description={
        <>
          Log–log. Line: cooling rate of a liquid droplet at the liquidus moving at the initial slip speed through the gas (Ranz–Marshall).
          Diamonds: mean cooling rate of each size class in flight, from leaving the nozzle to nucleation — lower, because droplets speed up
          with the gas. From {formatScientific(first.coolingRateKPerS)} K/s at {formatNumber(first.diameterM * 1e6, 2)} µm to{" "}
          {formatScientific(last.coolingRateKPerS)} K/s at {formatNumber(last.diameterM * 1e6, 2)} µm; a slope between −1.5 and −2 means the rate falls almost with the square of the size.
        </>
      }
    >
      <ResponsiveContainer width="100%" height="100%">
        <ScatterChart margin={{ top: 8, right: 12, bottom: 16, left: 4 }} accessibilityLayer={false}>
          <CartesianGrid stroke={GRID_STROKE} />
          <XAxis dataKey="d" type="number" scale="log" domain={[5, 1000]} ticks={[5, 10, 20, 50, 100, 200, 500, 1000]} tick={AXIS_TICK} allowDataOverflow label={{ value: "diameter, µm", position: "insideBottom", offset: -10, fontSize: 11, fill: "#38322c" }} />
          <YAxis dataKey="rate" type="number" scale="log" domain={[yTicks[0], yTicks[yTicks.length - 1]]} ticks={yTicks} tickFormatter={decadeLabel} tick={AXIS_TICK} width={48} allowDataOverflow />
          <ZAxis range={[50, 50]} />
          <Scatter data={curve} line={{ stroke: "#214c69", strokeWidth: 2.5 }} shape={() => <g />} isAnimationActive={false} />
          <Scatter data={points} fill="#c2500b" stroke="#72300b" shape="diamond" isAnimationActive={false} />
        </ScatterChart>
      </ResponsiveContainer>
    </ChartFigure>
  );
}

/** Relative density after HIP against pressure for several temperatures, with the chosen point. */
export function HipChart({ pressureMPa, tempC, outcome }: { pressureMPa: number; tempC: number; outcome: HipOutcome }) {
  const data = useMemo(() => hipCurves(), []);
  const styles: Record<number, { stroke: string; dash?: string }> = {
    900: { stroke: "#214c69", dash: "2 3" },
    1000: { stroke: "#3f7ea6", dash: "6 3" },
    1100: { stroke: "#7d4f8f", dash: "10 3 2 3" },
    1150: { stroke: "#c2500b" },
    1200: { stroke: "#72300b", dash: "4 2" },
  };
  return (
    <ChartFigure
      title="Hot isostatic pressing: density against pressure"
      description={
        <>
          Relative density of the canned powder (tap density 0.64) after the plastic-yielding stage of pressing, at{" "}
          {HIP_CURVE_TEMPS_C.join(", ")} °C. Hotter powder is softer, so it closes its pores at lower pressure. The open circle is your
          choice: {pressureMPa} MPa at {tempC} °C gives {formatNumber(outcome.relativeDensity * 100, 3)} % (stage {outcome.stage}, yield
          strength taken as {formatNumber(outcome.yieldStrengthMPa, 2)} MPa).
        </>
      }
      footer={
        <ul className="flex flex-wrap gap-x-4 gap-y-1">
          {HIP_CURVE_TEMPS_C.map((t) => (
            <li key={t} className="flex items-center gap-1.5">
              <svg width="26" height="8" aria-hidden="true">
                <line x1="0" y1="4" x2="26" y2="4" stroke={styles[t].stroke} strokeWidth={2.5} strokeDasharray={styles[t].dash} />
              </svg>
              {t} °C
            </li>
          ))}
        </ul>
      }
    >
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={data} margin={{ top: 8, right: 12, bottom: 16, left: 0 }} accessibilityLayer={false}>
          <CartesianGrid stroke={GRID_STROKE} />
          <XAxis dataKey="pressureMPa" type="number" domain={[0, 300]} ticks={[0, 50, 100, 150, 200, 250, 300]} tick={AXIS_TICK} label={{ value: "pressure, MPa", position: "insideBottom", offset: -10, fontSize: 11, fill: "#38322c" }} />
          <YAxis domain={[0.6, 1]} ticks={[0.6, 0.7, 0.8, 0.9, 1]} tick={AXIS_TICK} width={40} tickFormatter={(v: number) => `${Math.round(v * 100)}%`} />
          <ReferenceLine y={0.9} stroke="#a39a8f" strokeDasharray="3 3" label={{ value: "pores isolated", position: "insideBottomRight", fontSize: 10, fill: "#524a43" }} />
          {HIP_CURVE_TEMPS_C.map((t) => (
            <Line key={t} dataKey={`t${t}`} stroke={styles[t].stroke} strokeDasharray={styles[t].dash} strokeWidth={2.2} dot={false} isAnimationActive={false} />
          ))}
          <ReferenceDot x={pressureMPa} y={outcome.relativeDensity} r={6} fill="#ffffff" stroke="#1a1714" strokeWidth={2.5} />
        </LineChart>
      </ResponsiveContainer>
    </ChartFigure>
  );
}
