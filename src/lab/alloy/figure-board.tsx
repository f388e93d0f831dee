import { FIGURE_INFO, type AlloyReport, type FigureId, type FigureStatus } from "@shared/sim/alloy/report";
import { SLOTS } from "./slots";

const ORDER: FigureId[] = ["stainless", "free-chromium", "pren", "carbides", "hardness", "ms-retained-austenite", "wear-indices", "freezing", "ideal-diameter"];

const STATUS: Record<FigureStatus, { label: string; className: string; mark: string }> = {
  ok: { label: "inside the model's calibration", className: "text-success-700", mark: "✓" },
  warning: { label: "outside the model's calibration: read with care", className: "text-ember-700", mark: "!" },
  outside: { label: "not computed: outside the model's range", className: "text-danger-700", mark: "×" },
};

/** Every figure for every alloy: a block per figure, a cell per alloy, with method, source and warnings. */
export function FigureBoard({ reports }: { reports: readonly AlloyReport[] }) {
  const cols = reports.length === 1 ? "" : reports.length === 2 ? "@xl:grid-cols-2" : "@xl:grid-cols-3";
  return (
    <div className="space-y-3">
      {ORDER.map((id) => {
        const info = FIGURE_INFO[id];
        return (
          <section key={id} aria-labelledby={`figure-${id}`} className="rounded-md border border-bone-300 bg-white p-3" data-figure={id}>
            <h3 id={`figure-${id}`} className="font-display text-base font-semibold text-soot-900">
              {info.title}
            </h3>
            <div className={`mt-2 grid gap-2 ${cols}`}>
              {reports.map((r, i) => {
                const f = r.figures[id];
                const status = STATUS[f.status];
                return (
                  <div key={i} className="rounded-sm border-l-4 bg-bone-50 px-3 py-2" style={{ borderColor: SLOTS[i].colour }}>
                    <p className="text-xs text-soot-700">
                      <span aria-hidden="true" style={{ color: SLOTS[i].colour }}>
                        {SLOTS[i].symbol}{" "}
                      </span>
                      {r.alloy.name}
                    </p>
                    <p className="flex items-baseline gap-2">
                      <span className="font-mono text-lg font-semibold tabular-nums text-soot-900">{f.value}</span>
                      <span className={`text-xs font-semibold ${status.className}`} title={status.label}>
                        <span aria-hidden="true">{status.mark}</span>
                        <span className="sr-only">{status.label}</span>
                      </span>
                    </p>
                    {f.details.length ? (
                      <ul className="mt-0.5 text-xs leading-snug text-soot-700">
                        {f.details.map((d) => (
                          <li key={d}>{d}</li>
                        ))}
                      </ul>
                    ) : null}
                    {f.warnings.length ? (
                      <details className="mt-1 text-xs">
                        <summary className="cursor-pointer font-semibold text-ember-700">
                          {f.status === "outside" ? "Why it is not computed" : `Calibration warning${f.warnings.length > 1 ? `s (${f.warnings.length})` : ""}`}
                        </summary>
                        <ul className="mt-1 list-disc space-y-0.5 pl-4 text-soot-800">
                          {f.warnings.map((w) => (
                            <li key={w}>{w}</li>
                          ))}
                        </ul>
                      </details>
                    ) : null}
                  </div>
                );
              })}
            </div>
            <details className="mt-2 text-xs text-soot-700">
              <summary className="cursor-pointer font-semibold text-quench-700">How this is computed, and the source</summary>
              <p className="mt-1 leading-relaxed">{info.method}</p>
              <p className="mt-1 leading-relaxed">
                <span className="font-semibold">Source: </span>
                {info.source}
              </p>
            </details>
          </section>
        );
      })}
    </div>
  );
}
