/**
 * "What the science core says" about an entry: the computation from shared/api/notebook-compute.ts
 * (the server sends it; the form preview computes it with the same function), plus a picker for
 * the equivalent tempering time at another temperature, computed with the core's
 * equivalentTemperingHours as the user types.
 */
import { useId, useState, type ReactNode } from "react";
import { COLD_TREATMENT_LABELS, NOTEBOOK_LIMITS } from "@shared/api/notebook";
import { computeEquivalent, ROOM_TEMP_C, type NotebookComputation } from "@shared/api/notebook-compute";
import { cx } from "@/components/ui/cx";
import { formatHours, formatHrc, formatParameter, formatPercent, formatTempC } from "./format";

function Row({ label, value, detail, emphasis = false }: { label: string; value: ReactNode; detail?: ReactNode; emphasis?: boolean }) {
  return (
    <div className="grid grid-cols-[minmax(0,1fr)_auto] items-baseline gap-x-4 gap-y-0.5 border-b border-bone-200 py-2.5 last:border-b-0">
      <dt className="text-sm text-soot-700">{label}</dt>
      <dd className={cx("text-right font-mono tabular-nums text-soot-900", emphasis ? "text-lg font-semibold" : "text-base")}>{value}</dd>
      {detail ? <dd className="col-span-2 text-xs leading-snug text-soot-600">{detail}</dd> : null}
    </div>
  );
}

export function ComputedPanel({ computation, coldTreatment, headingId = "computed-heading", preview = false }: { computation: NotebookComputation; coldTreatment?: keyof typeof COLD_TREATMENT_LABELS; headingId?: string; preview?: boolean }) {
  const { tempering, hardening, readings } = computation;
  const inputId = useId();
  // Until the user types, follow the default the computation picked (20 °C above the temper).
  const [typed, setAtC] = useState<string | null>(null);
  const atC = typed ?? (computation.equivalent ? String(computation.equivalent.atC) : "");
  const atNumber = Number(atC);
  const atValid = atC.trim() !== "" && Number.isFinite(atNumber) && atNumber >= NOTEBOOK_LIMITS.temperC.min && atNumber <= NOTEBOOK_LIMITS.temperC.max;
  const equivalent = tempering && atValid ? computeEquivalent(tempering.parameter, atNumber) : null;
  const warnings = [...new Set([...(tempering?.warnings ?? []), ...hardening.warnings])];

  return (
    <section aria-labelledby={headingId} className="rounded-lg border border-quench-300 bg-quench-100/40 p-5 shadow-card">
      <p className="eyebrow text-quench-700">{preview ? "Live estimate" : "From the science core"}</p>
      <h2 id={headingId} className="mt-1 text-xl font-semibold text-soot-900">
        What the models say
      </h2>
      <p className="mt-1 text-sm leading-relaxed text-soot-700">
        {preview ? "Updated as you type, with the same functions the server uses when you save." : "Estimates from textbook models, to compare with what you measured."}
      </p>

      <h3 className="mt-4 font-sans text-sm font-semibold uppercase tracking-wide text-soot-600">Tempering</h3>
      {tempering ? (
        <dl className="mt-1">
          <Row
            label="Tempering parameter P"
            value={formatParameter(tempering.parameter)}
            emphasis
            detail={`Hollomon–Jaffe, C = ${tempering.constant}, time in hours: ${tempering.cycles} × ${formatHours(tempering.totalHours / tempering.cycles)} at ${formatTempC(tempering.tempC)} counted as ${formatHours(tempering.totalHours)}.`}
          />
          {tempering.parameterCarbonConstant !== null && tempering.carbonConstant !== null ? (
            <Row label={`P with C = ${tempering.carbonConstant.toFixed(2)} for this carbon`} value={formatParameter(tempering.parameterCarbonConstant)} />
          ) : null}
        </dl>
      ) : (
        <p className="mt-1 text-sm text-soot-700">Not tempered: add tempering cycles, a temperature and a time to see the tempering parameter.</p>
      )}

      {tempering ? (
        <div className="mt-3 rounded-md border border-bone-300 bg-white p-3">
          <label htmlFor={inputId} className="block text-sm font-semibold text-soot-800">
            Same temper at another temperature
          </label>
          <div className="mt-1.5 flex flex-wrap items-center gap-x-3 gap-y-2">
            <span className="inline-flex items-center gap-1.5">
              <input
                id={inputId}
                type="number"
                inputMode="decimal"
                min={NOTEBOOK_LIMITS.temperC.min}
                max={NOTEBOOK_LIMITS.temperC.max}
                step={5}
                value={atC}
                onChange={(e) => setAtC(e.target.value)}
                aria-describedby={`${inputId}-result`}
                className="min-h-10 w-24 rounded-md border border-soot-500/60 bg-white px-2 font-mono text-base tabular-nums"
              />
              <span className="text-sm text-soot-700">°C</span>
            </span>
            <output id={`${inputId}-result`} htmlFor={inputId} aria-live="polite" className="font-mono text-base font-semibold tabular-nums text-soot-900">
              {equivalent
                ? `${formatHours(equivalent.hours)} in total`
                : atValid
                  ? "beyond what the model can give"
                  : `enter ${NOTEBOOK_LIMITS.temperC.min}–${NOTEBOOK_LIMITS.temperC.max} °C`}
            </output>
          </div>
          <p className="mt-1 text-xs text-soot-600">Equal P gives roughly equal tempered hardness: a rule for trading time against temperature, not a recipe.</p>
        </div>
      ) : null}

      <h3 className="mt-5 font-sans text-sm font-semibold uppercase tracking-wide text-soot-600">Hardening</h3>
      <dl className="mt-1">
        <Row
          label="As-quenched hardness estimate"
          value={hardening.asQuenchedHrc !== null ? formatHrc(hardening.asQuenchedHrc) : "—"}
          emphasis
          detail={
            hardening.carbonInSolutionMassPct !== null
              ? `Martensite with ${hardening.carbonInSolutionMassPct.toFixed(2)} % C in solution after austenitising at ${formatTempC(hardening.austenitizeC)} (ASTM A255 curve).`
              : undefined
          }
        />
        <Row label="Martensite start, Ms" value={hardening.msC !== null ? formatTempC(Math.round(hardening.msC)) : "—"} detail="Andrews (1965), from the alloy in solution." />
        <Row
          label={`Retained austenite at ${ROOM_TEMP_C} °C`}
          value={hardening.retainedAusteniteAtRoom !== null ? formatPercent(hardening.retainedAusteniteAtRoom) : "—"}
          detail="Koistinen–Marburger, after the quench."
        />
        {hardening.coldTreatmentC !== null ? (
          <Row
            label={`After cold treatment at ${formatTempC(hardening.coldTreatmentC)}`}
            value={hardening.retainedAusteniteAfterCold !== null ? formatPercent(hardening.retainedAusteniteAfterCold) : "—"}
            detail={coldTreatment ? COLD_TREATMENT_LABELS[coldTreatment] : undefined}
          />
        ) : null}
      </dl>
      {hardening.unavailable.length > 0 ? (
        <ul className="mt-2 space-y-1 text-xs text-danger-700">
          {hardening.unavailable.map((u) => (
            <li key={u}>{u}</li>
          ))}
        </ul>
      ) : null}

      <h3 className="mt-5 font-sans text-sm font-semibold uppercase tracking-wide text-soot-600">Readings</h3>
      <dl className="mt-1">
        <Row
          label="Mean reading"
          value={readings.meanHrc !== null ? formatHrc(readings.meanHrc) : "—"}
          emphasis
          detail={readings.count > 0 ? `${readings.count} reading${readings.count === 1 ? "" : "s"}, ${readings.minHrc!.toFixed(1)}–${readings.maxHrc!.toFixed(1)} HRC.` : "No readings yet."}
        />
      </dl>

      {warnings.length > 0 ? (
        <details className="mt-4 rounded-md border border-bone-300 bg-white px-3 py-2 text-sm">
          <summary className="cursor-pointer font-semibold text-soot-800">Model limits that apply here ({warnings.length})</summary>
          <ul className="mt-2 list-disc space-y-1 pl-5 text-xs leading-relaxed text-soot-700">
            {warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        </details>
      ) : null}
      <p className="mt-3 text-xs leading-relaxed text-soot-600">
        The models ignore soak time, section size and quench severity, and the tempering parameter does not predict hardness by itself: it says which tempers should match. Compare with your readings and your
        steel maker&rsquo;s data sheet.
      </p>
    </section>
  );
}
