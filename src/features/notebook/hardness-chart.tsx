/**
 * The owner's hardness readings against the Hollomon–Jaffe tempering parameter, beside the
 * cohort's readings on the same steel (anonymous points from the server). Tempering harder
 * (higher P) should soften the steel: points should fall to the right.
 */
import { CartesianGrid, ResponsiveContainer, Scatter, ScatterChart, Tooltip, XAxis, YAxis, ZAxis } from "recharts";
import type { NotebookComparison } from "@shared/api/notebook";
import { AXIS_LABEL_STYLE, AXIS_TICK, ChartFrame, FIGURE_COLORS as C } from "@/components/mdx/figures/chart-frame";
import { formatParameter } from "./format";

interface Point {
  p: number;
  hrc: number;
}

function niceDomain(values: number[], pad: number, step: number): [number, number] {
  const lo = Math.min(...values) - pad;
  const hi = Math.max(...values) + pad;
  return [Math.floor(lo / step) * step, Math.ceil(hi / step) * step];
}

export function HardnessChart({ comparison, entryId, ownLabel }: { comparison: NotebookComparison; entryId: number; ownLabel: string }) {
  const current: Point[] = comparison.own.filter((pt) => pt.entryId === entryId).map((pt) => ({ p: pt.temperingParameter, hrc: pt.hrc }));
  const own: Point[] = comparison.own.filter((pt) => pt.entryId !== entryId).map((pt) => ({ p: pt.temperingParameter, hrc: pt.hrc }));
  const cohort: Point[] = comparison.cohort.map((pt) => ({ p: pt.temperingParameter, hrc: pt.hrc }));
  const all = [...current, ...own, ...cohort];

  if (all.length === 0) {
    return (
      <p className="rounded-md border border-dashed border-bone-300 bg-bone-50 p-4 text-sm text-soot-700">
        The chart appears once this entry has hardness readings and a tempering step. It places them against the tempering parameter, beside your cohort&rsquo;s readings on {comparison.steelLabel}.
      </p>
    );
  }
  const xDomain = niceDomain(all.map((pt) => pt.p), 150, 250);
  const yDomain = niceDomain(all.map((pt) => pt.hrc), 1.5, 2);
  const yStep = yDomain[1] - yDomain[0] > 16 ? 4 : 2;
  const yTicks = Array.from({ length: Math.floor((yDomain[1] - yDomain[0]) / yStep) + 1 }, (_, i) => yDomain[0] + i * yStep);
  const describe = (pts: Point[]) =>
    pts.length === 0 ? "none" : `${pts.length} reading${pts.length === 1 ? "" : "s"} from ${Math.min(...pts.map((x) => x.hrc)).toFixed(1)} to ${Math.max(...pts.map((x) => x.hrc)).toFixed(1)} HRC`;
  const description =
    `Scatter chart of Rockwell C hardness against tempering parameter for ${comparison.steelLabel}. ` +
    `This entry: ${describe(current)}${current.length ? ` at P ${formatParameter(current[0].p)}` : ""}. ${ownLabel}: ${describe(own)}. Cohort, same steel: ${describe(cohort)}.`;

  const series = [
    { key: "cohort", label: "Cohort, same steel", data: cohort, swatch: "rounded-full border border-quench-700 bg-quench-400" },
    { key: "own", label: ownLabel, data: own, swatch: "rounded-full border border-soot-900 bg-temper-bronze" },
    { key: "current", label: "This entry", data: current, swatch: "rotate-45 border-[1.5px] border-soot-900 bg-ember-500" },
  ].filter((x) => x.data.length > 0);

  return (
    <>
    <ul className="mb-2 flex flex-wrap gap-x-5 gap-y-1 text-sm text-soot-800" aria-label="Legend">
      {series.map((x) => (
        <li key={x.key} className="inline-flex items-center gap-2">
          <span aria-hidden="true" className={`inline-block size-2.5 ${x.swatch}`} />
          {x.label} <span className="font-mono text-xs text-soot-600">({x.data.length})</span>
        </li>
      ))}
    </ul>
    <ChartFrame
      height={300}
      description={description}
      note={`Each dot is one reading. P = T·(20 + log10 t), T in kelvin, t in hours. Cohort readings come from students who share a cohort, without names; only entries of ${comparison.steelLabel} are shown.`}
    >
      <ResponsiveContainer>
        <ScatterChart margin={{ top: 8, right: 12, bottom: 28, left: 8 }} accessibilityLayer={false}>
          <CartesianGrid stroke={C.grid} />
          <XAxis
            dataKey="p"
            type="number"
            name="Tempering parameter"
            domain={xDomain}
            tick={AXIS_TICK}
            tickFormatter={(v: number) => formatParameter(v)}
            label={{ value: "Tempering parameter P", position: "insideBottom", offset: -16, style: AXIS_LABEL_STYLE }}
          />
          <YAxis
            dataKey="hrc"
            type="number"
            name="Hardness"
            domain={yDomain}
            ticks={yTicks}
            tick={AXIS_TICK}
            width={52}
            label={{ value: "Hardness, HRC", angle: -90, position: "insideLeft", offset: 6, style: { ...AXIS_LABEL_STYLE, textAnchor: "middle" } }}
          />
          <ZAxis range={[60, 60]} />
          <Tooltip
            cursor={{ strokeDasharray: "3 3" }}
            formatter={(value, name) => (name === "Tempering parameter" ? formatParameter(Number(value)) : `${Number(value).toFixed(1)} HRC`)}
          />
          {cohort.length ? <Scatter name="Cohort, same steel" data={cohort} fill={C.quenchLight} fillOpacity={0.8} stroke={C.quench} isAnimationActive={false} /> : null}
          {own.length ? <Scatter name={ownLabel} data={own} fill={C.bronze} stroke={C.ink} strokeWidth={0.5} isAnimationActive={false} /> : null}
          {current.length ? <Scatter name="This entry" data={current} fill={C.emberLight} stroke={C.ink} strokeWidth={1.5} shape="diamond" isAnimationActive={false} /> : null}
        </ScatterChart>
      </ResponsiveContainer>
    </ChartFrame>
    </>
  );
}
