import { Bar, BarChart, CartesianGrid, LabelList, Legend, ResponsiveContainer, Scatter, ScatterChart, XAxis, YAxis, ZAxis } from "recharts";
import type { GradeIndexPoint, WearIndices } from "@shared/sim/carbides";

const STONE_NAME = { alumina: "aluminium oxide", "silicon-carbide": "silicon carbide", diamond: "diamond" } as const;

interface IndexChartsProps {
  label: string;
  indices: WearIndices;
  reference: GradeIndexPoint;
  scatter: GradeIndexPoint[] | null;
  currentGradeId: string | null;
  stone: keyof typeof STONE_NAME;
}

/** Edge-retention and sharpening-effort indices beside a plain-carbon reference, and every preset on both axes. */
export function IndexCharts({ label, indices, reference, scatter, currentGradeId, stone }: IndexChartsProps) {
  const bars = [
    { name: "Edge retention", current: round(indices.edgeRetention), reference: round(reference.edgeRetention) },
    { name: "Sharpening effort", current: round(indices.sharpeningEffort), reference: round(reference.sharpeningEffort) },
  ];
  // Grades that land on the same point share one mark and one label ("1095, 52100").
  const merged = new Map<string, GradeIndexPoint & { x: number; y: number; tag: string }>();
  for (const p of scatter ?? []) {
    const x = round(p.edgeRetention), y = round(p.sharpeningEffort);
    const key = `${x}|${y}|${p.gradeId === currentGradeId}`;
    const tag = p.label.replace(/^(AISI|SAE) /, "");
    const old = merged.get(key);
    merged.set(key, old ? { ...old, tag: `${old.tag}, ${tag}` } : { ...p, x, y, tag });
  }
  const points = [...merged.values()];
  const current = points.filter((p) => p.gradeId === currentGradeId);
  const others = points.filter((p) => p.gradeId !== currentGradeId);
  return (
    <div className="grid gap-4">
      <figure className="rounded-md border border-bone-300 bg-white p-3">
        <figcaption className="text-sm font-semibold text-soot-900">This steel beside plain carbon</figcaption>
        <p className="text-xs text-soot-600">
          Model indices, not lifetimes: 1 = a single 700 HV phase. Edge retention against quartz; sharpening effort on{" "}
          {STONE_NAME[stone]}. Solid bars: {label}. Hatched bars: {reference.label}.
        </p>
        <div className="mt-2 h-56" aria-hidden="true">
          <ResponsiveContainer width="100%" height="100%">
            <BarChart data={bars} margin={{ top: 16, right: 8, bottom: 4, left: 0 }} accessibilityLayer={false}>
              <defs>
                <pattern id="ref-hatch" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
                  <rect width="6" height="6" fill="#ebe3d5" />
                  <rect width="2.5" height="6" fill="#6b625a" />
                </pattern>
              </defs>
              <CartesianGrid stroke="#ebe3d5" vertical={false} />
              <XAxis dataKey="name" tick={{ fontSize: 11, fill: "#38322c" }} interval={0} />
              <YAxis tick={{ fontSize: 11, fill: "#38322c" }} width={36} />
              <Legend wrapperStyle={{ fontSize: 12 }} />
              <Bar dataKey="current" name={label} fill="#214c69" isAnimationActive={false}>
                <LabelList dataKey="current" position="top" fontSize={11} fill="#1a1714" />
              </Bar>
              <Bar dataKey="reference" name={reference.label} fill="url(#ref-hatch)" stroke="#524a43" isAnimationActive={false}>
                <LabelList dataKey="reference" position="top" fontSize={11} fill="#1a1714" />
              </Bar>
            </BarChart>
          </ResponsiveContainer>
        </div>
      </figure>
      <figure className="rounded-md border border-bone-300 bg-white p-3">
        <figcaption className="text-sm font-semibold text-soot-900">The compromise: every preset on both indices</figcaption>
        <p className="text-xs text-soot-600">
          Right = holds an edge longer against quartz; up = more effort on {STONE_NAME[stone]}. Model indices, not
          lifetimes. {currentGradeId ? "The ringed diamond is the steel shown." : ""}
        </p>
        <div className="mt-2 h-72" aria-hidden="true">
          {scatter ? (
            <ResponsiveContainer width="100%" height="100%">
              <ScatterChart margin={{ top: 16, right: 24, bottom: 8, left: 0 }} accessibilityLayer={false}>
                <CartesianGrid stroke="#ebe3d5" />
                <XAxis type="number" dataKey="x" name="Edge retention" tick={{ fontSize: 11, fill: "#38322c" }} domain={[0, "auto"]} label={{ value: "edge-retention index", position: "insideBottomRight", offset: -4, fontSize: 11, fill: "#38322c" }} />
                <YAxis type="number" dataKey="y" name="Sharpening effort" tick={{ fontSize: 11, fill: "#38322c" }} width={36} domain={[0, "auto"]} />
                <ZAxis range={[70, 70]} />
                <Scatter data={others} fill="#524a43" shape="circle" isAnimationActive={false}>
                  <LabelList dataKey="tag" position="right" fontSize={11} fill="#1a1714" />
                </Scatter>
                <Scatter data={current} fill="#c2500b" stroke="#1a1714" strokeWidth={2} shape="diamond" isAnimationActive={false}>
                  <LabelList dataKey="tag" position="right" fontSize={12} fontWeight={700} fill="#9a3e08" />
                </Scatter>
              </ScatterChart>
            </ResponsiveContainer>
          ) : (
            <p className="text-sm text-soot-600">Computing the presets…</p>
          )}
        </div>
      </figure>
      {scatter ? (
        <table className="text-sm">
          <caption className="sr-only">Edge-retention and sharpening-effort indices of the presets (model indices, not lifetimes)</caption>
          <thead>
            <tr className="text-left text-xs text-soot-600">
              <th scope="col" className="py-1 pr-3 font-semibold">Steel</th>
              <th scope="col" className="py-1 pr-3 font-semibold">Edge retention</th>
              <th scope="col" className="py-1 pr-3 font-semibold">Sharpening effort</th>
              <th scope="col" className="py-1 font-semibold">Carbides, vol %</th>
            </tr>
          </thead>
          <tbody className="font-mono tabular-nums">
            {scatter.map((p) => (
              <tr key={p.gradeId} className={p.gradeId === currentGradeId ? "font-bold text-ember-800" : "text-soot-900"}>
                <th scope="row" className="py-0.5 pr-3 text-left font-sans font-medium">{p.label}</th>
                <td className="py-0.5 pr-3">{p.edgeRetention.toFixed(2)}</td>
                <td className="py-0.5 pr-3">{p.sharpeningEffort.toFixed(2)}</td>
                <td className="py-0.5">{p.totalCarbideVolumePct.toFixed(1)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
    </div>
  );
}

const round = (v: number) => Math.round(v * 100) / 100;
