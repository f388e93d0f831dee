/**
 * The owner's hardness readings against the Hollomon–Jaffe tempering parameter, beside the
 * cohort's readings on the same steel (anonymous points from the server). Tempering harder
 * (higher P) should soften the steel: points should fall to the right.
 */
import { CartesianGrid, Legend, ResponsiveContainer, Scatter, ScatterChart, Tooltip, XAxis, YAxis, ZAxis } from "recharts";
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
  const describe = (pts: Point[]) =>
    pts.length === 0 ? "none" : `${pts.length} reading${pts.length === 1 ? "" : "s"} from ${Math.min(...pts.map((x) => x.hrc)).toFixed(1)} to ${Math.max(...pts.map((x) => x.hrc)).toFixed(1)} HRC`;
  const description =
    `Scatter chart of Rockwell C hardness against tempering parameter for ${comparison.steelLabel}. ` +
    `This entry: ${describe(current)}${current.length ? ` at P ${formatParameter(current[0].p)}` : ""}. ${ownLabel}: ${describe(own)}. Cohort, same steel: ${describe(cohort)}.`;

  return (
    <ChartFrame
      height={320}
      description={description}
      note={`Each dot is one reading. P = T·(20 + log10 t), T in kelvin, t in hours. Cohort readings come from students who share a cohort, without names; only entries of ${comparison.steelLabel} are shown.`}
    >
      <ResponsiveContainer>
        <ScatterChart margin={{ top: 8, right: 16, bottom: 28, left: 4 }} accessibilityLayer={false}>
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
          <YAxis dataKey="hrc" type="number" name="Hardness" unit="" domain={yDomain} tick={AXIS_TICK} width={44} label={{ value: "HRC", position: "insideTopLeft", dy: -4, dx: 6, style: AXIS_LABEL_STYLE }} />
          <ZAxis range={[60, 60]} />
          <Tooltip
            cursor={{ strokeDasharray: "3 3" }}
            formatter={(value, name) => (name === "Tempering parameter" ? formatParameter(Number(value)) : `${Number(value).toFixed(1)} HRC`)}
          />
          <Legend verticalAlign="top" height={30} wrapperStyle={{ fontSize: 12 }} />
          <Scatter name="Cohort, same steel" data={cohort} fill={C.quenchLight} fillOpacity={0.75} stroke={C.quench} isAnimationActive={false} />
          <Scatter name={ownLabel} data={own} fill={C.bronze} stroke={C.ink} strokeWidth={0.5} isAnimationActive={false} />
          <Scatter name="This entry" data={current} fill={C.emberLight} stroke={C.ink} strokeWidth={1.5} shape="diamond" isAnimationActive={false} />
        </ScatterChart>
      </ResponsiveContainer>
    </ChartFrame>
  );
}
