import { memo, useCallback, useEffect, useMemo, useRef, useState } from "react";
import { z } from "zod";
import { chromiumMassPctFromAtomFraction, percolationThreshold } from "@shared/metallurgy";
import {
  describe,
  PASSIVE_FILM_DEFAULTS,
  passiveFilmParamsSchema,
  scratch,
  step,
  summarise,
  type PassiveFilmParams,
  type PassiveFilmSummary,
  type SitePoint,
} from "@shared/sim/passive-film";
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
import { PassiveFilmControls } from "./controls";
import { FilmChart } from "./film-chart";
import { PassiveFilmHowComputed } from "./how-computed";
import { NETWORK_LEGEND, SURFACE_LEGEND } from "./legend-items";
import { formatSpeed, neighbourModelLabel, SPEEDS } from "./model-options";
import type { DisplayMode } from "./paint";
import { halfCrossing, SpanningChart } from "./spanning-chart";
import { SurfaceCanvas, type SurfaceCanvasHandle } from "./surface-canvas";
import { SurfaceStats } from "./surface-stats";
import { useSpanningCurve } from "./use-spanning-curve";
import { useSurfaceModel } from "./use-surface-model";

export interface PassiveFilmSimulationProps {
  /** Initial parameters, e.g. a lesson's preset; names as in content/AUTHORING.md. */
  initial?: Record<string, unknown>;
  /** Called with the current settings whenever they change (a lesson's simulation task submits them). */
  onParamsChange?: (params: Record<string, unknown>) => void;
}

/** Lesson preset (if any), else the page's URL search parameters, validated by the simulation's schema. */
function resolveInitial(initial: Record<string, unknown> | undefined): { params: PassiveFilmParams; error: string | null } {
  const raw = initial ?? readSearchParams(currentSearch(), passiveFilmParamsSchema);
  const parsed = passiveFilmParamsSchema.safeParse(raw);
  return parsed.success ? { params: parsed.data, error: null } : { params: PASSIVE_FILM_DEFAULTS, error: z.prettifyError(parsed.error) };
}

const MemoSurfaceCanvas = memo(SurfaceCanvas);
const SUMMARY_INTERVAL_MS = 250;

export default function PassiveFilmSimulation({ initial, onParamsChange }: PassiveFilmSimulationProps) {
  const [{ params: startParams, error: presetError }] = useState(() => resolveInitial(initial));
  const [params, setParams] = useState(startParams);
  const onParamsChangeRef = useRef(onParamsChange);
  onParamsChangeRef.current = onParamsChange;
  useEffect(() => {
    onParamsChangeRef.current?.(params as unknown as Record<string, unknown>);
  }, [params]);
  const reducedMotion = usePrefersReducedMotion();
  const [playing, setPlaying] = useState(() => !(typeof window !== "undefined" && window.matchMedia?.("(prefers-reduced-motion: reduce)").matches));
  const [speed, setSpeed] = useState(4);
  const [mode, setMode] = useState<DisplayMode>("surface");
  const [scratchTool, setScratchTool] = useState(() => !(typeof window !== "undefined" && window.matchMedia?.("(pointer: coarse)").matches));
  const [scratchPaths, setScratchPaths] = useState<SitePoint[][]>([]);
  const currentPath = useRef<SitePoint[] | null>(null);
  const [summary, setSummary] = useState<PassiveFilmSummary | null>(null);
  const { state, building, error: buildError, reset } = useSurfaceModel(params);
  const canvas = useRef<SurfaceCanvasHandle>(null);
  const [wrapRef, width] = useElementWidth<HTMLDivElement>();
  const sizePx = Math.max(200, Math.min(width, 768));
  const spanning = useSpanningCurve(params, params.view === "spanning");

  const patch = useCallback((p: Partial<PassiveFilmParams>) => setParams((old) => ({ ...old, ...p })), []);

  const lastSummary = useRef(0);
  const refreshSummary = useCallback(
    (force = false) => {
      if (!state) return;
      const now = performance.now();
      if (!force && now - lastSummary.current < SUMMARY_INTERVAL_MS) return;
      lastSummary.current = now;
      setSummary(summarise(state));
    },
    [state],
  );

  // New state (rebuild, reset) or environment change: clear scratches and describe it at once.
  useEffect(() => {
    setScratchPaths([]);
    refreshSummary(true);
  }, [state, params.environment, refreshSummary]);

  const advance = useCallback(
    (modelDtS: number) => {
      if (!state) return;
      measured("passive-film:step", () => step(state, modelDtS));
      canvas.current?.paintChanged();
      state.changedCount = 0;
      refreshSummary();
    },
    [state, refreshSummary],
  );

  const running = playing && !building && !!state && params.view === "surface";
  useAnimationFrame(running, (dtS) => advance(dtS * speed));

  const onScratchSegment = useCallback(
    (a: SitePoint, b: SitePoint) => {
      if (!state) return;
      scratch(state, a, b);
      canvas.current?.paintChanged();
      state.changedCount = 0;
      if (!currentPath.current) currentPath.current = [a];
      currentPath.current.push(b);
      refreshSummary();
    },
    [state, refreshSummary],
  );
  const onScratchEnd = useCallback(() => {
    const path = currentPath.current;
    currentPath.current = null;
    if (path && path.length > 1) setScratchPaths((old) => [...old, path]);
    refreshSummary(true);
  }, [refreshSummary]);

  const cutAcross = () => {
    if (!state) return;
    const L = state.sizeSites;
    const y = L * (0.3 + 0.4 * ((scratchPaths.length * 0.37) % 1));
    onScratchSegment({ x: 6, y }, { x: L - 6, y: y + L * 0.08 });
    onScratchEnd();
  };

  const text = useMemo(() => {
    if (buildError) return `The surface could not be built: ${buildError}`;
    if (!state || !summary) return "Building the alloy lattice…";
    if (params.view === "spanning") {
      const curve = spanning.curve;
      if (!curve) return `Computing the spanning-probability curve for ${neighbourModelLabel(params)}…`;
      const half = halfCrossing(curve);
      return `Spanning view, ${neighbourModelLabel(params)}: ${
        half !== null ? `the chance that chromium connects passes one half at about ${half.toFixed(1)} % Cr` : "chromium never connects below 30 % Cr"
      }. This alloy has ${summary.freeCrMassPct.toFixed(1)} % free chromium.`;
    }
    return describe(state, summary);
  }, [buildError, state, summary, params, spanning.curve]);

  const literature = percolationThreshold(params.lattice, params.neighbours);
  const stage = (
    <>
      <div className="flex flex-wrap items-end justify-between gap-3">
        <ChoiceField
          legend="View"
          value={params.view}
          choices={[{ value: "surface", label: "Surface" }, { value: "spanning", label: "Spanning probability" }]}
          onChange={(view) => patch({ view })}
        />
        {params.view === "surface" ? (
          <ChoiceField
            legend="Show"
            value={mode}
            choices={[{ value: "surface", label: "Film and rust" }, { value: "network", label: "Chromium network" }]}
            onChange={setMode}
          />
        ) : null}
      </div>
      {presetError ? <Alert tone="danger" title="This preset was not accepted; the defaults are shown.">{presetError}</Alert> : null}
      <div ref={wrapRef} className="w-full">
        {params.view === "surface" ? (
          <div className="relative" style={{ width: sizePx }}>
            {state && width > 0 ? (
              <MemoSurfaceCanvas
                ref={canvas}
                state={state}
                mode={mode}
                sizePx={sizePx}
                scratchTool={scratchTool}
                scratchPaths={scratchPaths}
                onScratchSegment={onScratchSegment}
                onScratchEnd={onScratchEnd}
              />
            ) : (
              <div className="rounded-md bg-soot-900" style={{ width: sizePx, height: sizePx }} />
            )}
            {building ? (
              <p className="absolute left-2 top-2 rounded-xs bg-soot-950/85 px-2 py-1 font-mono text-xs text-bone-50">
                Building the alloy…
              </p>
            ) : null}
          </div>
        ) : (
          <SpanningChart
            curve={spanning.curve}
            progress={spanning.progress}
            error={spanning.error}
            crMassPct={params.crMassPct}
            freeCrMassPct={summary?.freeCrMassPct ?? params.crMassPct}
            literatureThresholdMassPct={params.connectivity === "bulk" && literature ? chromiumMassPctFromAtomFraction(literature.pc) : null}
            modelLabel={neighbourModelLabel(params)}
          />
        )}
      </div>
      <p className="sr-only">
        The surface is drawn on a canvas; the summary below describes it in words and updates as the simulation runs.
      </p>
      <LiveSummary text={text} />
      {params.view === "surface" ? (
        <>
          <Legend items={mode === "surface" ? SURFACE_LEGEND : NETWORK_LEGEND} />
          {summary ? <SurfaceStats summary={summary} /> : null}
        </>
      ) : null}
    </>
  );

  const controls = (
    <>
      <TransportBar
        playing={playing}
        onPlayPause={() => setPlaying((p) => !p)}
        onStep={() => advance(speed * 0.5)}
        onReset={reset}
        speed={speed}
        speeds={SPEEDS}
        onSpeed={setSpeed}
        formatSpeed={formatSpeed}
        disabled={building || params.view !== "surface"}
      />
      {reducedMotion && !playing ? (
        <p className="text-xs text-soot-600">Paused because your system asks for reduced motion. Press Play to run.</p>
      ) : null}
      <div className="space-y-2 rounded-sm bg-bone-100 p-3">
        <label className="flex items-start gap-2 text-sm text-soot-800">
          <input type="checkbox" className="mt-1 size-4 accent-ember-600" checked={scratchTool} onChange={(e) => setScratchTool(e.target.checked)} />
          <span>
            <span className="font-semibold">Scratch tool</span>
            <span className="block text-xs text-soot-600">Drag across the surface to cut the film.</span>
          </span>
        </label>
        <button
          type="button"
          onClick={cutAcross}
          disabled={!state || params.view !== "surface"}
          className="min-h-10 w-full rounded-sm border border-soot-500/60 bg-white px-3 text-sm font-semibold text-soot-900 hover:border-soot-900 disabled:opacity-50"
        >
          Cut a scratch across the surface
        </button>
      </div>
      <PassiveFilmControls params={params} onChange={patch} />
    </>
  );

  return (
    <SimLayout
      label="Passive film simulation"
      stage={stage}
      controls={controls}
      footer={
        <>
          {params.view === "surface" && summary ? <FilmChart timeS={roundTime(summary.timeS)} meanFilmNm={summary.meanFilmNm} /> : null}
          <PassiveFilmHowComputed />
        </>
      }
    />
  );
}

/** Two significant digits: the log-time chart only needs redrawing when the marker visibly moves. */
function roundTime(timeS: number): number {
  if (timeS <= 0) return 0;
  const p = 10 ** (Math.floor(Math.log10(timeS)) - 1);
  return Math.round(timeS / p) * p;
}
