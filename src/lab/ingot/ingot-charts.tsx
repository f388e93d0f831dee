import { useMemo } from "react";
import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Scatter, ScatterChart, XAxis, YAxis, ZAxis } from "recharts";
import type { IngotElement } from "@shared/sim/ingot/params";
import type { IngotRun } from "@shared/sim/ingot/run";
import type { SweepPoint } from "@shared/sim/ingot/chvorinov-sweep";
import { MC_LAST_LIQUID_V_THRESHOLD_MASS_PCT } from "@shared/sim/ingot/carbide-risk";
import { formatDuration, formatMassPct, formatNumber } from "@shared/sim/alloy/format";
import { AXIS_TICK, ChartFigure, decadeLabel, decadeTicks, GRID_STROKE } from "@/lab/shared-ui/chart-figure";

/** Line styles per element: colour plus dash, so lines differ without colour. */
const ELEMENT_STYLE: Record<IngotElement, { stroke: string; dash?: string }> = {
  C: { stroke: "#1a1714" },
  Cr: { stroke: "#2d6488", dash: "8 3" },
  V: { stroke: "#c2500b", dash: "2 3" },
  Mo: { stroke: "#7d4f8f", dash: "10 3 2 3" },
  Mn: { stroke: "#2f6b3a", dash: "5 5" },
  Si: { stroke: "#6b625a", dash: "1 4" },
};
const SEGREGATION_MAX = 3;

function distanceMm(run: IngotRun, i: number): number {
  return Math.round(run.positionM[i] * 10000) / 10;
}

/** Final mean composition / melt composition from wall to centre, every tracked element. */
export function SegregationChart({ run, element }: { run: IngotRun; element: IngotElement }) {
  const data = useMemo(
    () =>
      Array.from({ length: run.cells }, (_, i) => {
        const row: Record<string, number> = { x: distanceMm(run, i) };
        for (const el of run.tracked) row[el] = run.final.meanMassPct[el]![i] / (run.nominalMassPct[el] ?? 1);
        return row;
      }),
    [run],
  );
  const n = run.cells;
  const chosen = run.final.meanMassPct[element];
  const nominal = run.nominalMassPct[element] ?? 0;
  const centre = chosen ? chosen[n - 1] / nominal : null;
  return (
    <ChartFigure
      title="Segregation from wall to centre, after freezing"
      description={
        chosen ? (
          <>
            Composition of the solid relative to the melt (1 = no segregation). {element}: {formatMassPct(chosen[0])} at the wall,{" "}
            {formatMassPct(chosen[Math.floor(n / 2)])} at mid-radius, {formatMassPct(chosen[n - 2])} next to the centre (melt{" "}
            {formatMassPct(nominal)}).
            {centre !== null && centre > SEGREGATION_MAX
              ? run.tracked.includes("C")
                ? ` The centre point (${centre.toFixed(1)}×) is off the scale: the last liquid to freeze is the most enriched. The model lets it enrich until its carbon reaches the iron–carbon eutectic (4.3 % C), where what is left freezes at its own composition; alloying lowers that limit in real steels.`
                : ` The centre point (${centre.toFixed(1)}×) is off the scale: without carbon nothing bounds the enrichment of the last liquid, so the model exaggerates it.`
              : ""}
          </>
        ) : (
          <>This alloy has no {element}; the other elements are shown.</>
        )
      }
      footer={<ElementKey run={run} element={element} />}
    >
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={data} margin={{ top: 8, right: 12, bottom: 14, left: 0 }} accessibilityLayer={false}>
          <CartesianGrid stroke={GRID_STROKE} />
          <XAxis dataKey="x" type="number" domain={[0, run.radiusM * 1000]} tick={AXIS_TICK} unit=" mm" label={{ value: "distance from the wall", position: "insideBottom", offset: -8, fontSize: 11, fill: "#38322c" }} />
          <YAxis domain={[0, SEGREGATION_MAX]} ticks={[0, 0.5, 1, 1.5, 2, 2.5, 3]} allowDataOverflow tick={AXIS_TICK} width={42} tickFormatter={(v: number) => `${v}×`} />
          <ReferenceLine y={1} stroke="#524a43" strokeWidth={1} />
          {run.tracked.map((el) => (
            <Line
              key={el}
              dataKey={el}
              stroke={ELEMENT_STYLE[el].stroke}
              strokeDasharray={ELEMENT_STYLE[el].dash}
              strokeWidth={el === element ? 3 : 1.3}
              strokeOpacity={el === element ? 1 : 0.7}
              dot={false}
              isAnimationActive={false}
            />
          ))}
        </LineChart>
      </ResponsiveContainer>
    </ChartFigure>
  );
}

function ElementKey({ run, element }: { run: IngotRun; element: IngotElement }) {
  return (
    <ul className="flex flex-wrap gap-x-4 gap-y-1">
      {run.tracked.map((el) => (
        <li key={el} className="flex items-center gap-1.5">
          <svg width="26" height="8" aria-hidden="true">
            <line x1="0" y1="4" x2="26" y2="4" stroke={ELEMENT_STYLE[el].stroke} strokeWidth={el === element ? 3 : 1.5} strokeDasharray={ELEMENT_STYLE[el].dash} />
          </svg>
          <span className={el === element ? "font-semibold" : undefined}>{el}</span>
        </li>
      ))}
    </ul>
  );
}

/** Carbon and vanadium of the last interdendritic liquid (f_s = 0.95) across the section, with the thresholds. */
export function LastLiquidChart({ run }: { run: IngotRun }) {
  const v = run.final.lastLiquidMassPct.V;
  const c = run.final.lastLiquidMassPct.C;
  const data = useMemo(
    () => Array.from({ length: run.cells - 1 }, (_, i) => ({ x: distanceMm(run, i), V: v?.[i] ?? null, C: c?.[i] ?? null })),
    [run, v, c],
  );
  const yMax = 20;
  return (
    <ChartFigure
      title="The last liquid between the dendrite arms"
      description={
        <>
          Composition of the liquid that freezes last in each part of the section (at 95 % solid), mass %. Coarse primary vanadium carbide
          (MC) is taken to form where this liquid holds at least {MC_LAST_LIQUID_V_THRESHOLD_MASS_PCT} % V (dotted line); a eutectic with
          carbide where its carbon reaches the eutectic value (4.3 % C, lowered by chromium; the liquid cannot hold more, so carbon stops there).
          Both thresholds are model choices. The centre
          point is left out.
          {v ? ` V: ${formatMassPct(v[0])} near the wall, ${formatMassPct(v[run.cells - 2])} near the centre.` : " This alloy has no V."}
          {c ? ` C: ${formatMassPct(c[0])} near the wall, ${formatMassPct(c[run.cells - 2])} near the centre.` : ""}
        </>
      }
      footer={
        <span className="flex flex-wrap gap-x-4">
          <span>
            <svg width="26" height="8" aria-hidden="true" className="mr-1 inline">
              <line x1="0" y1="4" x2="26" y2="4" stroke={ELEMENT_STYLE.V.stroke} strokeWidth={3} strokeDasharray={ELEMENT_STYLE.V.dash} />
            </svg>
            V in the last liquid
          </span>
          <span>
            <svg width="26" height="8" aria-hidden="true" className="mr-1 inline">
              <line x1="0" y1="4" x2="26" y2="4" stroke={ELEMENT_STYLE.C.stroke} strokeWidth={2.5} />
            </svg>
            C in the last liquid
          </span>
        </span>
      }
    >
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={data} margin={{ top: 8, right: 12, bottom: 14, left: 0 }} accessibilityLayer={false}>
          <CartesianGrid stroke={GRID_STROKE} />
          <XAxis dataKey="x" type="number" domain={[0, run.radiusM * 1000]} tick={AXIS_TICK} unit=" mm" label={{ value: "distance from the wall", position: "insideBottom", offset: -8, fontSize: 11, fill: "#38322c" }} />
          <YAxis domain={[0, yMax]} ticks={[0, 5, 10, 15, 20]} allowDataOverflow tick={AXIS_TICK} width={42} unit="%" />
          <ReferenceLine y={MC_LAST_LIQUID_V_THRESHOLD_MASS_PCT} stroke={ELEMENT_STYLE.V.stroke} strokeDasharray="2 2" label={{ value: "MC threshold", position: "insideTopRight", fontSize: 10, fill: "#9a3e08" }} />
          {v ? <Line dataKey="V" stroke={ELEMENT_STYLE.V.stroke} strokeDasharray={ELEMENT_STYLE.V.dash} strokeWidth={3} dot={false} isAnimationActive={false} /> : null}
          {c ? <Line dataKey="C" stroke={ELEMENT_STYLE.C.stroke} strokeWidth={2.5} dot={false} isAnimationActive={false} /> : null}
        </LineChart>
      </ResponsiveContainer>
    </ChartFigure>
  );
}

type ProfileKey = "localFreezingTimeS" | "coolingRateCPerS" | "armSpacingUm";

const PROFILE: Record<ProfileKey, { title: string; unit: string; stroke: string; format: (v: number) => string }> = {
  localFreezingTimeS: { title: "Local freezing time", unit: "s", stroke: "#214c69", format: formatDuration },
  coolingRateCPerS: { title: "Cooling rate through the freezing range", unit: "°C/s", stroke: "#9a3e08", format: (v) => `${formatNumber(v)} °C/s` },
  armSpacingUm: { title: "Secondary dendrite arm spacing λ2", unit: "µm", stroke: "#2f6b3a", format: (v) => `${formatNumber(v)} µm` },
};

/** One of the three across-the-section profiles on a log scale. */
export function ProfileChart({ run, quantity }: { run: IngotRun; quantity: ProfileKey }) {
  const spec = PROFILE[quantity];
  const values = run.final[quantity];
  const data = useMemo(() => {
    const rows: { x: number; y: number }[] = [];
    for (let i = 0; i < run.cells; i++) if (values[i] > 0) rows.push({ x: distanceMm(run, i), y: values[i] });
    return rows;
  }, [run, values]);
  const ys = data.map((d) => d.y);
  const min = ys.length ? Math.min(...ys) : 1;
  const max = ys.length ? Math.max(...ys) : 10;
  const ticks = decadeTicks(min, max);
  const n = run.cells;
  return (
    <ChartFigure
      title={spec.title}
      heightClass="h-44"
      description={
        data.length === 0 ? (
          <>Not defined for this alloy (no carbon, or the node froze in one step).</>
        ) : (
          <>
            Log scale. Near the wall {spec.format(values[1] || values[0])}, mid-radius {spec.format(values[Math.floor(n / 2)])}, centre{" "}
            {spec.format(values[n - 1])}.
          </>
        )
      }
    >
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={data} margin={{ top: 8, right: 10, bottom: 4, left: 4 }} accessibilityLayer={false}>
          <CartesianGrid stroke={GRID_STROKE} />
          <XAxis dataKey="x" type="number" domain={[0, run.radiusM * 1000]} tick={AXIS_TICK} unit=" mm" />
          <YAxis
            dataKey="y"
            type="number"
            scale="log"
            domain={[ticks[0] ?? "auto", ticks[ticks.length - 1] ?? "auto"]}
            ticks={ticks}
            tickFormatter={decadeLabel}
            allowDataOverflow
            tick={AXIS_TICK}
            width={44}
          />
          <Line dataKey="y" stroke={spec.stroke} strokeWidth={2.5} dot={false} isAnimationActive={false} />
        </LineChart>
      </ResponsiveContainer>
    </ChartFigure>
  );
}

/** Model freezing time against casting modulus for this mould, beside Chvorinov's rule for sand. */
export function ChvorinovChart({ sweep, run }: { sweep: SweepPoint[] | null; run: IngotRun }) {
  const current = [{ modulusCm: run.chvorinov.modulusCm, t: run.totalTimeS / 60 }];
  const model = useMemo(() => sweep?.map((p) => ({ modulusCm: p.modulusCm, t: p.modelTimeMin })) ?? null, [sweep]);
  const rule = useMemo(() => {
    const rows = [];
    for (let k = 0; k <= 20; k++) {
      const m = 1.25 * (37.5 / 1.25) ** (k / 20);
      rows.push({ modulusCm: m, t: 2 * m * m });
    }
    return rows;
  }, []);
  return (
    <ChartFigure
      title="Freezing time (minutes) against casting modulus"
      heightClass="h-56"
      description={
        <>
          Log–log. Points: this model for the chosen mould at diameters 50–1500 mm (open circle: your ingot,{" "}
          {formatDuration(run.totalTimeS)}). Line: Chvorinov&rsquo;s rule t = B·M² with B = 2 min/cm² for a sand mould (illustrative),
          giving {formatDuration(run.chvorinov.sandRuleTimeS)} for M = {formatNumber(run.chvorinov.modulusCm)} cm.
          {sweep ? "" : " Computing the other sizes…"}
        </>
      }
    >
      <ResponsiveContainer width="100%" height="100%">
        <ScatterChart margin={{ top: 8, right: 12, bottom: 14, left: 4 }} accessibilityLayer={false}>
          <CartesianGrid stroke={GRID_STROKE} />
          <XAxis
            dataKey="modulusCm"
            type="number"
            scale="log"
            domain={[1, 40]}
            ticks={[1, 2, 5, 10, 20, 40]}
            tick={AXIS_TICK}
            unit=" cm"
            allowDataOverflow
            label={{ value: "modulus M = V/A", position: "insideBottom", offset: -8, fontSize: 11, fill: "#38322c" }}
          />
          <YAxis dataKey="t" type="number" scale="log" domain={[0.1, 10000]} ticks={[0.1, 1, 10, 100, 1000, 10000]} tickFormatter={decadeLabel} tick={AXIS_TICK} width={40} allowDataOverflow />
          <ZAxis range={[60, 60]} />
          <Scatter data={rule} line={{ stroke: "#524a43", strokeWidth: 2, strokeDasharray: "6 4" }} shape={() => <g />} isAnimationActive={false} />
          {model ? <Scatter data={model} fill="#2d6488" shape="diamond" isAnimationActive={false} /> : null}
          <Scatter data={current} fill="#ffffff" stroke="#c2500b" strokeWidth={2.5} isAnimationActive={false} />
        </ScatterChart>
      </ResponsiveContainer>
    </ChartFigure>
  );
}
