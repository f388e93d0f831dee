import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import { z } from "zod";
import {
  carbideParamsSchema,
  currentEdgeMetrics,
  describeCarbides,
  ensureEdge,
  ensureWornEdge,
  parseCarbideParams,
  resolveAlloy,
  setHours,
  stateFromBase,
  step,
  type BaseField,
  type CarbideParams,
  type CarbideSimState,
  type GradeIndexPoint,
  type StoneId,
} from "@shared/sim/carbides";
import { Alert } from "@/components/ui/alert";
import { measured } from "@/lab/shared-ui/bench-marks";
import { ChoiceField } from "@/lab/shared-ui/choice-field";
import { Legend } from "@/lab/shared-ui/legend";
import { LiveSummary } from "@/lab/shared-ui/live-summary";
import { SimLayout } from "@/lab/shared-ui/sim-layout";
import { TransportBar } from "@/lab/shared-ui/transport-bar";
import { useAnimationFrame } from "@/lab/shared-ui/use-animation-frame";
import { useElementWidth } from "@/lab/shared-ui/use-element-width";
import { usePrefersReducedMotion } from "@/lab/shared-ui/use-reduced-motion";
import { currentSearch, readSearchParams } from "@/lab/shared-ui/url-params";
import { CarbideStats } from "./carbide-stats";
import { CarbideControls } from "./controls";
import { EdgeCanvas } from "./edge-canvas";
import { FieldCanvas, type CanvasHandle } from "./field-canvas";
import { CarbidesHowComputed } from "./how-computed";
import { IndexCharts } from "./index-charts";
import { carbideLegend } from "./legend-items";
import { CarbideWorker } from "./worker-client";

export interface CarbideSimulationProps {
  /** Initial parameters, e.g. a lesson's preset; names as in content/AUTHORING.md. */
  initial?: Record<string, unknown>;
  /** Called with the current settings whenever they change (a lesson's simulation task submits them). */
  onParamsChange?: (params: Record<string, unknown>) => void;
}

function resolveInitial(initial: Record<string, unknown> | undefined): { params: CarbideParams; error: string | null } {
  const raw = initial ?? readSearchParams(currentSearch(), carbideParamsSchema);
  const parsed = carbideParamsSchema.safeParse(raw);
  return parsed.success ? { params: parseCarbideParams(parsed.data), error: null } : { params: parseCarbideParams({}), error: z.prettifyError(parsed.error) };
}

const STONE_NAME: Record<StoneId, string> = { alumina: "aluminium oxide", "silicon-carbide": "silicon carbide", diamond: "diamond" };
const SPEEDS = [0.25, 1, 4] as const;
const UI_INTERVAL_MS = 250;

export default function CarbideSimulation({ initial, onParamsChange }: CarbideSimulationProps) {
  const [{ params: start, error: presetError }] = useState(() => resolveInitial(initial));
  const [params, setParams] = useState<CarbideParams>(start);
  const onParamsChangeRef = useRef(onParamsChange);
  onParamsChangeRef.current = onParamsChange;
  useEffect(() => {
    onParamsChangeRef.current?.(params as unknown as Record<string, unknown>);
  }, [params]);
  const [hours, setHoursValue] = useState(start.coarseningHours);
  const reducedMotion = usePrefersReducedMotion();
  const [playing, setPlaying] = useState(false);
  const [speed, setSpeed] = useState(1);
  const [base, setBase] = useState<BaseField | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [sim, setSim] = useState<CarbideSimState | null>(null);
  const [, setTick] = useState(0);
  const [scatter, setScatter] = useState<GradeIndexPoint[] | null>(null);
  const [restore, setRestore] = useState<Record<StoneId, number | null> | null>(null);
  const canvas = useRef<CanvasHandle>(null);
  const workers = useRef<{ base: CarbideWorker; jobs: CarbideWorker } | null>(null);
  const [wrapRef, width] = useElementWidth<HTMLDivElement>();
  const sizePx = Math.max(200, Math.min(width, 768));
  const paramsRef = useRef(params);
  paramsRef.current = params;
  const hoursRef = useRef(hours);
  hoursRef.current = hours;

  useEffect(() => {
    workers.current = { base: new CarbideWorker(), jobs: new CarbideWorker() };
    return () => { workers.current?.base.dispose(); workers.current?.jobs.dispose(); };
  }, []);

  // 1. Sample the annealed field in the worker when composition, seed or size model change.
  const baseKey = JSON.stringify([params.grade, params.C, params.Cr, params.V, params.W, params.Mo, params.seed, params.sizeModel, params.fieldUm]);
  useEffect(() => {
    let cancelled = false;
    const timer = window.setTimeout(() => {
      workers.current?.base
        .base(paramsRef.current)
        .then((b) => { if (!cancelled) { setBase(b); setError(null); } })
        .catch((err: Error) => { if (!cancelled && err.message !== "cancelled") setError(err.message); });
    }, 120);
    return () => { cancelled = true; window.clearTimeout(timer); };
  }, [baseKey]);

  // 2. Everything that depends on state, temperature and stone: cheap, on the main thread.
  const stateKey = JSON.stringify([params.state, params.austenitizingTempC, params.abrasive, params.grade, params.C, params.Cr, params.V, params.W, params.Mo]);
  useEffect(() => {
    if (!base) return;
    try {
      const s = stateFromBase({ ...paramsRef.current, coarseningHours: hoursRef.current }, base);
      setSim(s);
      setRestore(null);
      setError(null);
    } catch (err) {
      setError(err instanceof Error ? err.message : String(err));
    }
  }, [base, stateKey]);

  // The view and its edge.
  useEffect(() => {
    if (!sim) return;
    sim.params = { ...sim.params, view: params.view };
    if (params.view === "edge") ensureEdge(sim);
    if (params.view === "sharpen") ensureWornEdge(sim);
    setTick((t) => t + 1);
  }, [sim, params.view]);

  // Strokes to restore on every stone, for the sharpening view (worker).
  useEffect(() => {
    if (!sim || params.view !== "sharpen" || !sim.wornEdge || restore) return;
    let cancelled = false;
    workers.current?.jobs.restore(sim.wornEdge).then((r) => { if (!cancelled) setRestore(r); }).catch(() => undefined);
    return () => { cancelled = true; };
  }, [sim, params.view, restore]);

  // Preset scatter for the chart view (worker).
  useEffect(() => {
    if (params.view !== "chart") return;
    let cancelled = false;
    setScatter(null);
    workers.current?.jobs.scatter(params.state, params.abrasive).then((p) => { if (!cancelled) setScatter(p); }).catch(() => undefined);
    return () => { cancelled = true; };
  }, [params.view, params.state, params.abrasive]);

  const lastUi = useRef(0);
  const onFrame = useCallback(
    (dtS: number) => {
      if (!sim) return;
      const more = measured("carbides:step", () => step(sim, dtS, speed));
      canvas.current?.redraw();
      const now = performance.now();
      if (!more || now - lastUi.current > UI_INTERVAL_MS) {
        lastUi.current = now;
        if (sim.params.view === "field") setHoursValue(sim.hours);
        setTick((t) => t + 1);
      }
      if (!more) setPlaying(false);
    },
    [sim, speed],
  );
  useAnimationFrame(playing && !!sim && params.view !== "chart", onFrame);

  const patch = useCallback((p: Partial<CarbideParams>) => setParams((old) => ({ ...old, ...p })), []);
  const onPreset = (gradeId: string) =>
    setParams((old) => ({ ...old, grade: gradeId, C: undefined, Cr: undefined, V: undefined, W: undefined, Mo: undefined, austenitizingTempC: undefined }));
  const onHours = (h: number) => {
    setHoursValue(h);
    if (sim) { setHours(sim, h); canvas.current?.redraw(); setTick((t) => t + 1); }
  };
  const reset = () => {
    if (!sim) return;
    if (params.view === "field") onHours(0);
    else if (params.view === "edge") { sim.edge = null; sim.wornEdge = null; ensureEdge(sim); setTick((t) => t + 1); }
    else if (params.view === "sharpen" && sim.wornEdge) { sim.edge = null; sim.wornEdge = null; ensureWornEdge(sim); setTick((t) => t + 1); }
  };

  const alloy = useMemo(() => resolveAlloy(params), [params]);
  const edgeMetrics = sim ? currentEdgeMetrics(sim) : null;
  const text = error ? `The simulation could not compute this steel: ${error}` : sim ? describeCarbides(sim) : "Sampling the carbide field…";
  const label = sim
    ? params.view === "field"
      ? `Micrograph-like field of ${sim.alloy.label}: ${sim.visible.count} carbide particles in a ${sim.params.state === "hardened" ? "martensite" : "ferrite"} matrix.`
      : `Cross-section of a cutting edge of ${sim.alloy.label}.`
    : "Carbide simulation loading";

  const stage = (
    <>
      <ChoiceField
        legend="View"
        value={params.view}
        choices={[{ value: "field", label: "Field" }, { value: "edge", label: "Edge wear" }, { value: "sharpen", label: "Sharpening" }, { value: "chart", label: "Index charts" }]}
        onChange={(view) => { setPlaying(false); patch({ view }); }}
      />
      {presetError ? <Alert tone="danger" title="This preset was not accepted; the defaults are shown.">{presetError}</Alert> : null}
      {error ? <Alert tone="danger" title="This steel cannot be computed">{error}</Alert> : null}
      <div ref={wrapRef} className="w-full">
        {!sim || width === 0 ? (
          <div className="flex items-center justify-center rounded-md bg-soot-900 font-mono text-sm text-bone-50" style={{ width: sizePx, height: sizePx }}>
            Sampling the carbide field…
          </div>
        ) : params.view === "field" ? (
          <FieldCanvas ref={canvas} sim={sim} sizePx={sizePx} label={label} />
        ) : params.view === "chart" ? (
          <IndexCharts label={sim.alloy.label} indices={sim.indices} reference={sim.reference} scatter={scatter} currentGradeId={sim.alloy.gradeId} stone={params.abrasive} />
        ) : sim.edge ? (
          <EdgeCanvas
            ref={canvas}
            edge={sim.edge}
            hardened={sim.params.state === "hardened"}
            sizePx={sizePx}
            mode={params.view === "edge" ? "edge" : "sharpen"}
            stoneName={STONE_NAME[params.abrasive]}
            label={label}
          />
        ) : null}
      </div>
      {params.view === "field" ? <p className="text-xs text-soot-600">Hover over or tap a particle to name it.</p> : null}
      <LiveSummary text={text} />
      {sim && params.view !== "chart" ? <Legend items={carbideLegend(sim.base.types, sim.params.state, params.view !== "field")} /> : null}
      {sim ? <CarbideStats sim={sim} edge={edgeMetrics} restore={restore} /> : null}
    </>
  );

  const controls = (
    <>
      {params.view !== "chart" ? (
        <TransportBar
          playing={playing}
          onPlayPause={() => setPlaying((p) => !p)}
          onStep={() => onFrame(0.25)}
          onReset={reset}
          speed={speed}
          speeds={SPEEDS}
          onSpeed={setSpeed}
          formatSpeed={(s) => `×${s}`}
          disabled={!sim}
        />
      ) : null}
      {params.view !== "chart" ? (
        <p className="text-xs text-soot-600">
          {params.view === "field" ? "Play holds the steel at temperature: carbides coarsen." : params.view === "edge" ? "Play runs cutting cycles." : "Play sharpens until the edge is restored."}
          {reducedMotion ? " Nothing moves until you press Play." : ""}
        </p>
      ) : null}
      <CarbideControls params={params} alloy={alloy} hours={hours} onChange={patch} onHours={onHours} onPreset={onPreset} />
    </>
  );

  return <SimLayout label="Carbide population simulation" stage={stage} controls={controls} footer={<CarbidesHowComputed />} />;
}
