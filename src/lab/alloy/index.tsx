import { memo, useDeferredValue, useEffect, useMemo, useRef, useState } from "react";
import { z } from "zod";
import {
  DEFAULT_ALLOYS,
  MAX_ALLOYS,
  paramsSchema,
  resolveAlloy,
  type AlloyParams,
  type AlloySpec,
} from "@shared/sim/alloy/params";
import { alloyReport, type AlloyReport } from "@shared/sim/alloy/report";
import { describeComparison } from "@shared/sim/alloy/summary";
import { decodeAlloyParams, encodeAlloyParams } from "@shared/sim/alloy/url-state";
import { AUSTENITIZING_RANGE_C } from "@shared/sim/alloy/austenitizing";
import { COLD_TREATMENT_RANGE_C } from "@shared/sim/alloy/params";
import type { AlloyComposition } from "@shared/api/alloys";
import { Alert } from "@/components/ui/alert";
import { measured } from "@/lab/shared-ui/bench-marks";
import { ChoiceField } from "@/lab/shared-ui/choice-field";
import { LiveSummary } from "@/lab/shared-ui/live-summary";
import { SliderField } from "@/lab/shared-ui/slider-field";
import { AlloyEditor } from "./alloy-editor";
import { CarbideChart, IndexChart, RetainedAusteniteChart } from "./alloy-charts";
import { AlloyMethod } from "./alloy-method";
import { FigureBoard } from "./figure-board";
import { SavedAlloys } from "./saved-alloys";

export interface AlloyExplorerProps {
  /** Initial parameters, e.g. a lesson's preset: `{ alloys: [...] }` as in content/AUTHORING.md. */
  initial?: Record<string, unknown>;
  /** Called with the current parameters (quiz tasks read the learner's alloys). */
  onParamsChange?: (params: Record<string, unknown>) => void;
}

const MemoCarbideChart = memo(CarbideChart);
const MemoIndexChart = memo(IndexChart);
const MemoRetainedAusteniteChart = memo(RetainedAusteniteChart);
const MemoFigureBoard = memo(FigureBoard);
const MemoAlloyMethod = memo(AlloyMethod);

/** Lesson preset when embedded; otherwise the page's URL (a shared link), else the defaults. */
function resolveInitial(initial: Record<string, unknown> | undefined): { params: AlloyParams; problems: string[] } {
  if (initial !== undefined) {
    const parsed = paramsSchema.safeParse(initial);
    return parsed.success ? { params: parsed.data, problems: [] } : { params: paramsSchema.parse({}), problems: [z.prettifyError(parsed.error)] };
  }
  const decoded = decodeAlloyParams(typeof window === "undefined" ? "" : window.location.search);
  return { params: decoded.params ?? paramsSchema.parse({}), problems: decoded.problems };
}

const URL_WRITE_DELAY_MS = 250;

export default function AlloyExplorer({ initial, onParamsChange }: AlloyExplorerProps) {
  const standalone = initial === undefined;
  const [{ params: start, problems }] = useState(() => resolveInitial(initial));
  const [alloys, setAlloys] = useState<AlloySpec[]>(start.alloys);
  const [coldTreatmentC, setColdTreatmentC] = useState(start.coldTreatmentC);
  const [austenitizingTempC, setAustenitizingTempC] = useState<number | undefined>(start.austenitizingTempC);
  const [selected, setSelected] = useState(0);
  const params: AlloyParams = useMemo(
    () => ({ alloys, coldTreatmentC, ...(austenitizingTempC !== undefined ? { austenitizingTempC } : {}) }),
    [alloys, coldTreatmentC, austenitizingTempC],
  );

  // One report per alloy, recomputed only for the alloy that changed (a slider moves one alloy).
  const cache = useRef(new Map<string, AlloyReport>());
  const reports = useMemo(
    () =>
      measured("alloy:compute", () => {
        const next = new Map<string, AlloyReport>();
        const list = alloys.map((spec) => {
          const key = JSON.stringify([spec, coldTreatmentC, austenitizingTempC ?? null]);
          const report = cache.current.get(key) ?? alloyReport(resolveAlloy(spec), { coldTreatmentC, austenitizingTempC: austenitizingTempC ?? null });
          next.set(key, report);
          return report;
        });
        cache.current = next;
        return list;
      }),
    [alloys, coldTreatmentC, austenitizingTempC],
  );

  // The comparison lives in the URL (standalone only: an embedded explorer leaves the lesson's URL alone).
  useEffect(() => {
    if (!standalone) return;
    const timer = window.setTimeout(() => {
      const query = encodeAlloyParams(params);
      const url = `${window.location.pathname}?${query}${window.location.hash}`;
      if (url !== window.location.pathname + window.location.search + window.location.hash) window.history.replaceState(window.history.state, "", url);
    }, URL_WRITE_DELAY_MS);
    return () => window.clearTimeout(timer);
  }, [params, standalone]);

  const onParamsChangeRef = useRef(onParamsChange);
  onParamsChangeRef.current = onParamsChange;
  useEffect(() => {
    onParamsChangeRef.current?.(params as unknown as Record<string, unknown>);
  }, [params]);

  const selectedIndex = Math.min(selected, alloys.length - 1);
  const current = resolveAlloy(alloys[selectedIndex]);
  const currentComposition = current.composition as AlloyComposition;
  const summary = describeComparison(reports);
  // The figures and charts re-render in a deferred pass: the slider and the summary answer at once,
  // the heavy SVG follows when the browser is free (dimmed meanwhile, so the delay is visible).
  const deferredReports = useDeferredValue(reports);
  const deferredCold = useDeferredValue(coldTreatmentC);
  const pending = deferredReports !== reports;

  const updateAlloy = (index: number, spec: AlloySpec) => setAlloys((old) => old.map((a, i) => (i === index ? spec : a)));
  const addAlloy = () => {
    if (alloys.length >= MAX_ALLOYS) return;
    const used = new Set(alloys.map((a) => ("grade" in a ? a.grade : "")));
    const candidates: string[] = [...DEFAULT_ALLOYS.map((a) => a.grade), "A11", "M2", "52100"];
    const next = candidates.find((g) => !used.has(g)) ?? "1095";
    setAlloys((old) => [...old, { grade: next }]);
    setSelected(alloys.length);
  };
  const removeAlloy = (index: number) => {
    setAlloys((old) => old.filter((_, i) => i !== index));
    setSelected((s) => Math.max(0, Math.min(s, alloys.length - 2)));
  };

  return (
    <section aria-label="Alloy explorer" className="@container space-y-5">
      {problems.length ? (
        <Alert tone="danger" title="Part of the link or preset could not be used">
          <ul className="list-disc pl-5">
            {problems.map((p) => (
              <li key={p} className="whitespace-pre-wrap">
                {p}
              </li>
            ))}
          </ul>
        </Alert>
      ) : null}
      <div className="grid gap-5 @5xl:grid-cols-[minmax(0,1fr)_20rem]">
        <form className="min-w-0 rounded-lg border border-bone-300 bg-white p-4 shadow-card" aria-label="Alloy compositions" onSubmit={(e) => e.preventDefault()}>
          <AlloyEditor alloys={alloys} selected={selectedIndex} onSelect={setSelected} onChange={updateAlloy} onAdd={addAlloy} onRemove={removeAlloy} />
        </form>
        <div className="min-w-0 space-y-4">
          <form className="space-y-3 rounded-lg border border-bone-300 bg-white p-4 shadow-card" aria-label="Heat treatment assumed" onSubmit={(e) => e.preventDefault()}>
            <ChoiceField<"typical" | "fixed">
              legend="Hardening temperature"
              value={austenitizingTempC === undefined ? "typical" : "fixed"}
              choices={[
                { value: "typical", label: "Typical for each alloy" },
                { value: "fixed", label: "One for all" },
              ]}
              onChange={(v) => setAustenitizingTempC(v === "typical" ? undefined : (reports[selectedIndex]?.austenitizingTempC ?? 1050))}
              hint={
                austenitizingTempC === undefined
                  ? reports.map((r) => `${r.alloy.name}: ${r.austenitizingTempC} °C (${r.austenitizingFamily})`).join("; ") + " — common practice."
                  : undefined
              }
            />
            {austenitizingTempC !== undefined ? (
              <SliderField
                label="Austenitizing temperature"
                value={austenitizingTempC}
                min={AUSTENITIZING_RANGE_C.min}
                max={AUSTENITIZING_RANGE_C.max}
                step={10}
                unit="°C"
                onChange={setAustenitizingTempC}
              />
            ) : null}
            <SliderField
              label="Cold treatment after the quench"
              value={coldTreatmentC}
              min={COLD_TREATMENT_RANGE_C.min}
              max={COLD_TREATMENT_RANGE_C.max}
              step={2}
              unit="°C"
              hint="Dry ice is about −78 °C, liquid nitrogen −196 °C."
              onChange={setColdTreatmentC}
            />
          </form>
          <SavedAlloys
            current={{ name: current.name, composition: currentComposition }}
            onOpen={(spec) => updateAlloy(selectedIndex, spec)}
          />
        </div>
      </div>
      <LiveSummary text={summary} throttleMs={600} label="Key figures now" />
      <div className={`space-y-5 transition-opacity ${pending ? "opacity-60" : ""}`} aria-busy={pending}>
        <div className="grid gap-4 @3xl:grid-cols-2">
          <MemoCarbideChart reports={deferredReports} />
          <div className="space-y-4">
            <MemoIndexChart reports={deferredReports} />
            <MemoRetainedAusteniteChart reports={deferredReports} coldTreatmentC={deferredCold} />
          </div>
        </div>
        <MemoFigureBoard reports={deferredReports} />
      </div>
      <MemoAlloyMethod />
    </section>
  );
}

