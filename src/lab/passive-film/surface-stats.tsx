import { formatModelTime, type PassiveFilmSummary } from "@shared/sim/passive-film";

/** Key numbers beside the canvas, in the mono face. */
export function SurfaceStats({ summary: s }: { summary: PassiveFilmSummary }) {
  const items: [string, string][] = [
    ["Model time", formatModelTime(s.timeS)],
    ["Free Cr in matrix", `${s.freeCrMassPct.toFixed(1)} %`],
    ["Cr network", s.connected ? "connected" : "not connected"],
    ["Film / rust", `${Math.round(s.filmFraction * 100)} % / ${Math.round(s.rustFraction * 100)} %`],
    ["Mean film", s.meanFilmNm !== null ? `${s.meanFilmNm.toFixed(2)} nm` : "—"],
    ["Scratch", s.scratch.total === 0 ? "none" : s.scratch.rust > 0 ? "rusting" : s.scratch.film === s.scratch.total ? "healed" : "healing"],
  ];
  return (
    <dl className="grid grid-cols-2 gap-2 @xl:grid-cols-3">
      {items.map(([label, value]) => (
        <div key={label} className="rounded-sm border border-bone-300 bg-white px-3 py-2">
          <dt className="text-xs text-soot-600">{label}</dt>
          <dd className="font-mono text-base font-semibold tabular-nums text-soot-900">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
