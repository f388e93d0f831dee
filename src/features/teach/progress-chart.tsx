/** Cohort progress over time: mean completion of the assigned work per day, with the due dates marked. */
import { Area, Bar, CartesianGrid, ComposedChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { CohortAnalytics } from "@shared/api/gradebook";
import { CHART, TICK } from "./chart-style";
import { formatShortDate, percent } from "@/lib/format";

export function ProgressChart({ analytics }: { analytics: CohortAnalytics }) {
  const points = analytics.progress.map((p) => ({ ...p, pct: Math.round(p.completion * 1000) / 10 }));
  if (points.length === 0) return <p className="text-sm text-soot-700">Progress appears here once work is assigned and students are enrolled.</p>;
  const first = points[0];
  const last = points[points.length - 1];
  const attempts = points.reduce((s, p) => s + p.attempts, 0);
  const summary = `Completion went from ${percent(first.completion)} on ${formatShortDate(first.date)} to ${percent(last.completion)} on ${formatShortDate(last.date)}, with ${attempts} quiz attempts in that time.`;
  const inRange = analytics.dueDates.filter((d) => d.date >= first.date && d.date <= last.date);

  return (
    <figure>
      <figcaption className="text-sm text-soot-700">{summary}</figcaption>
      <div className="mt-3 h-64" aria-hidden="true">
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart accessibilityLayer={false} data={points} margin={{ top: 12, right: 8, bottom: 0, left: 0 }}>
            <CartesianGrid stroke={CHART.grid} vertical={false} />
            <XAxis dataKey="date" tickFormatter={(d: string) => formatShortDate(d)} tick={TICK} minTickGap={24} />
            <YAxis yAxisId="pct" domain={[0, 100]} ticks={[0, 25, 50, 75, 100]} tickFormatter={(v: number) => `${v} %`} tick={TICK} width={44} />
            <YAxis yAxisId="n" orientation="right" allowDecimals={false} tick={TICK} width={28} />
            <Tooltip
              labelFormatter={(d) => formatShortDate(String(d))}
              formatter={(value, name) => (name === "pct" ? [`${String(value)} %`, "completion"] : [String(value), "quiz attempts"])}
            />
            <Bar yAxisId="n" dataKey="attempts" fill={CHART.straw} barSize={6} isAnimationActive={false} />
            <Area yAxisId="pct" type="monotone" dataKey="pct" stroke={CHART.quench} strokeWidth={2} fill={CHART.quenchLight} fillOpacity={0.35} isAnimationActive={false} />
            {inRange.map((d) => (
              <ReferenceLine key={`${d.date}-${d.moduleTitle}`} yAxisId="pct" x={d.date} stroke={CHART.ember} strokeDasharray="4 3" label={{ value: "due", position: "top", fill: CHART.ember, fontSize: 11 }} />
            ))}
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <p className="mt-2 flex flex-wrap gap-x-4 gap-y-1 text-xs text-soot-700">
        <span className="inline-flex items-center gap-1.5">
          <span className="inline-block h-2.5 w-4 rounded-xs bg-quench-300" /> completion of assigned work (left axis)
        </span>
        <span className="inline-flex items-center gap-1.5">
          <span className="inline-block h-2.5 w-1.5 rounded-xs bg-temper-straw" /> quiz attempts per day (right axis)
        </span>
        <span className="inline-flex items-center gap-1.5">
          <span className="inline-block h-0 w-4 border-t-2 border-dashed border-ember-600" /> due date
        </span>
      </p>
    </figure>
  );
}
