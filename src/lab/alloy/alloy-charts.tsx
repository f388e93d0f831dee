import { Bar, BarChart, CartesianGrid, Legend as ChartLegend, ReferenceLine, ResponsiveContainer, XAxis, YAxis } from "recharts";
import type { CarbideType } from "@shared/metallurgy/carbides/carbide-data";
import type { AlloyReport } from "@shared/sim/alloy/report";
import { formatNumber } from "@shared/sim/alloy/format";
import { AXIS_TICK, ChartFigure, GRID_STROKE } from "@/lab/shared-ui/chart-figure";

const CARBIDE_FILL: Record<CarbideType, { fill: string; label: string }> = {
  MC: { fill: "#1a1714", label: "MC (vanadium carbide)" },
  M6C: { fill: "#7d4f8f", label: "M6C (W–Mo carbide)" },
  M7C3: { fill: "#2d6488", label: "M7C3 (chromium carbide)" },
  M23C6: { fill: "#97bfd9", label: "M23C6 (chromium carbide)" },
  M3C: { fill: "#c08a45", label: "M3C (cementite)" },
};
const TYPES: CarbideType[] = ["MC", "M6C", "M7C3", "M23C6", "M3C"];

/** Legend labels in body text colour (the series colours alone would not reach 4.5:1 on white). */
const legendText = (value: string) => <span style={{ color: "#38322c" }}>{value}</span>;

function shortName(r: AlloyReport, i: number): string {
  const n = r.alloy.name;
  return `${["■", "●", "▲"][i]} ${n.length > 16 ? `${n.slice(0, 15)}…` : n}`;
}

/** Carbide volume by type, annealed and after hardening, stacked per alloy. */
export function CarbideChart({ reports }: { reports: readonly AlloyReport[] }) {
  const rows = reports.flatMap((r, i) =>
    (["annealed", "hardened"] as const).map((state) => {
      const row: Record<string, string | number> = { name: `${shortName(r, i)} · ${state}` };
      for (const b of r.numbers.carbides) row[b.type] = state === "annealed" ? b.annealedVolumePct : b.hardenedVolumePct;
      return row;
    }),
  );
  const present = TYPES.filter((t) => reports.some((r) => r.numbers.carbides.some((b) => b.type === t && b.annealedVolumePct > 0)));
  return (
    <ChartFigure
      title="Carbide types and volume"
      heightClass="h-80 @3xl:h-[30rem]"
      description={
        <>
          Volume per cent of each carbide type, annealed and after hardening.{" "}
          {reports
            .map((r) =>
              r.numbers.totalCarbideVolumePct
                ? `${r.alloy.name}: ${formatNumber(r.numbers.totalCarbideVolumePct.annealed, 2)} % annealed, ${formatNumber(r.numbers.totalCarbideVolumePct.hardened, 2)} % hardened`
                : `${r.alloy.name}: not computed`,
            )
            .join("; ")}
          .
        </>
      }
    >
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={rows} layout="vertical" margin={{ top: 4, right: 12, bottom: 4, left: 8 }} accessibilityLayer={false}>
          <CartesianGrid stroke={GRID_STROKE} horizontal={false} />
          <XAxis type="number" tick={AXIS_TICK} unit="%" />
          <YAxis type="category" dataKey="name" tick={{ ...AXIS_TICK, fontSize: 10 }} width={150} />
          {present.map((t) => (
            <Bar key={t} dataKey={t} stackId="c" fill={CARBIDE_FILL[t].fill} name={CARBIDE_FILL[t].label} stroke="#ffffff" strokeWidth={1} isAnimationActive={false} />
          ))}
          <ChartLegend wrapperStyle={{ fontSize: 11 }} formatter={legendText} />
        </BarChart>
      </ResponsiveContainer>
    </ChartFigure>
  );
}

/** Edge-retention and sharpening-effort indices per alloy, against the plain 700 HV reference (1). */
export function IndexChart({ reports }: { reports: readonly AlloyReport[] }) {
  const rows = reports.map((r, i) => ({
    name: shortName(r, i),
    edge: r.numbers.edgeRetention ?? 0,
    alumina: r.numbers.sharpeningAlumina ?? 0,
    diamond: r.numbers.sharpeningDiamond ?? 0,
  }));
  return (
    <ChartFigure
      title="Edge retention and sharpening effort (model indices)"
      heightClass="h-64"
      description={
        <>
          Relative to a plain 700 HV matrix (line at 1); higher edge retention lasts longer against quartz grit, higher sharpening effort
          takes longer on the stone. Model indices, not lifetimes.{" "}
          {reports
            .map((r) => `${r.alloy.name}: edge ${formatNumber(r.numbers.edgeRetention ?? NaN, 3)}, aluminium-oxide stone ${formatNumber(r.numbers.sharpeningAlumina ?? NaN, 3)}, diamond ${formatNumber(r.numbers.sharpeningDiamond ?? NaN, 3)}`)
            .join("; ")}
          .
        </>
      }
    >
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={rows} margin={{ top: 8, right: 8, bottom: 4, left: 0 }} accessibilityLayer={false}>
          <CartesianGrid stroke={GRID_STROKE} vertical={false} />
          <XAxis dataKey="name" tick={{ ...AXIS_TICK, fontSize: 10 }} interval={0} />
          <YAxis tick={AXIS_TICK} width={32} />
          <ReferenceLine y={1} stroke="#524a43" strokeDasharray="4 3" />
          <Bar dataKey="edge" name="Edge retention (quartz)" fill="#c2500b" isAnimationActive={false} />
          <Bar dataKey="alumina" name="Sharpening, aluminium oxide" fill="#2d6488" isAnimationActive={false} />
          <Bar dataKey="diamond" name="Sharpening, diamond" fill="#a39a8f" stroke="#38322c" isAnimationActive={false} />
          <ChartLegend wrapperStyle={{ fontSize: 11 }} formatter={legendText} />
        </BarChart>
      </ResponsiveContainer>
    </ChartFigure>
  );
}

/** Retained austenite at room temperature and after the cold treatment. */
export function RetainedAusteniteChart({ reports, coldTreatmentC }: { reports: readonly AlloyReport[]; coldTreatmentC: number }) {
  const rows = reports.map((r, i) => ({
    name: shortName(r, i),
    room: (r.numbers.retainedAusteniteRoom ?? 0) * 100,
    cold: (r.numbers.retainedAusteniteCold ?? 0) * 100,
  }));
  return (
    <ChartFigure
      title="Retained austenite after the quench"
      heightClass="h-56"
      description={
        <>
          Per cent of austenite left at 20 °C and after cooling on to {coldTreatmentC} °C (Koistinen–Marburger with Andrews&rsquo; Ms).{" "}
          {reports.map((r) => `${r.alloy.name}: Ms ${r.numbers.msC === null ? "—" : `${Math.round(r.numbers.msC)} °C`}`).join("; ")}.
        </>
      }
    >
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={rows} margin={{ top: 8, right: 8, bottom: 4, left: 0 }} accessibilityLayer={false}>
          <CartesianGrid stroke={GRID_STROKE} vertical={false} />
          <XAxis dataKey="name" tick={{ ...AXIS_TICK, fontSize: 10 }} interval={0} />
          <YAxis tick={AXIS_TICK} width={36} unit="%" />
          <Bar dataKey="room" name="at 20 °C" fill="#9a3e08" isAnimationActive={false} />
          <Bar dataKey="cold" name={`after ${coldTreatmentC} °C`} fill="#68a0c6" stroke="#214c69" isAnimationActive={false} />
          <ChartLegend wrapperStyle={{ fontSize: 11 }} formatter={legendText} />
        </BarChart>
      </ResponsiveContainer>
    </ChartFigure>
  );
}
