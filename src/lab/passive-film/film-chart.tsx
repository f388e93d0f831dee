import { useMemo } from "react";
import { CartesianGrid, Line, LineChart, ReferenceArea, ReferenceLine, ResponsiveContainer, XAxis, YAxis } from "recharts";
import { PASSIVE_FILM_OBSERVED_RANGE_NM, passiveFilmThicknessNm } from "@shared/metallurgy";
import { formatModelTime } from "@shared/sim/passive-film";

const T_MIN_S = 0.1;
const T_MAX_S = 3.156e7; // one year
const TICKS = [1, 60, 3600, 86400, 3.156e7];
const TICK_LABEL: Record<number, string> = { 1: "1 s", 60: "1 min", 3600: "1 h", 86400: "1 day", 3.156e7: "1 yr" };

/** Film thickness against log time from the core's two logarithmic laws, with the current model time marked. */
export function FilmChart({ timeS, meanFilmNm }: { timeS: number; meanFilmNm: number | null }) {
  const data = useMemo(() => {
    const points = [];
    for (let k = 0; k <= 60; k++) {
      const t = T_MIN_S * (T_MAX_S / T_MIN_S) ** (k / 60);
      points.push({ t, direct: passiveFilmThicknessNm(t, "direct-log"), inverse: passiveFilmThicknessNm(t, "inverse-log") });
    }
    return points;
  }, []);
  const now = Math.min(T_MAX_S, Math.max(T_MIN_S, timeS));
  return (
    <figure className="rounded-md border border-bone-300 bg-white p-3">
      <figcaption className="text-sm font-semibold text-soot-900">Film thickness against time (log scale)</figcaption>
      <p className="text-xs text-soot-600">
        Solid: direct-log law used by the animation. Dashed: inverse-log (Cabrera–Mott type) law. Shaded: the 1–3 nm
        observed on stainless steels. Vertical line: now ({formatModelTime(timeS)}
        {meanFilmNm !== null ? `, mean film ${meanFilmNm.toFixed(2)} nm` : ""}).
      </p>
      <div className="mt-2 h-48" aria-hidden="true">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={data} margin={{ top: 8, right: 12, bottom: 4, left: 0 }} accessibilityLayer={false}>
            <CartesianGrid stroke="#ebe3d5" />
            <XAxis dataKey="t" type="number" scale="log" domain={[T_MIN_S, T_MAX_S]} ticks={TICKS} tickFormatter={(v: number) => TICK_LABEL[v] ?? ""} tick={{ fontSize: 11, fill: "#38322c" }} allowDataOverflow />
            <YAxis domain={[0.8, 3.2]} ticks={[1, 2, 3]} tick={{ fontSize: 11, fill: "#38322c" }} width={44} unit=" nm" allowDataOverflow />
            <ReferenceArea y1={PASSIVE_FILM_OBSERVED_RANGE_NM.min} y2={PASSIVE_FILM_OBSERVED_RANGE_NM.max} fill="#c7dcea" fillOpacity={0.35} />
            <Line dataKey="direct" stroke="#214c69" strokeWidth={2.5} dot={false} isAnimationActive={false} />
            <Line dataKey="inverse" stroke="#9a3e08" strokeWidth={2} strokeDasharray="6 4" dot={false} isAnimationActive={false} />
            <ReferenceLine x={now} stroke="#1a1714" strokeWidth={1.5} label={{ value: "now", position: "insideTopRight", fontSize: 11, fill: "#1a1714" }} />
          </LineChart>
        </ResponsiveContainer>
      </div>
    </figure>
  );
}
