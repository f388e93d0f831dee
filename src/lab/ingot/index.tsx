import { memo, useCallback, useEffect, useMemo, useRef, useState } from "react";
import { z } from "zod";
import {
  paramsSchema,
  resolveIngotSimParams,
  toIngotParams,
  type IngotElement,
  type ResolvedIngotSimParams,
} from "@shared/sim/ingot/params";
import { createFrameView, findFronts, readFrame, type Fronts, type IngotFrameView } from "@shared/sim/ingot/frames";
import { describeIngotFrame } from "@shared/sim/ingot/summary";
import { formatDuration } from "@shared/sim/alloy/format";
import { Alert } from "@/components/ui/alert";
import { measured } from "@/lab/shared-ui/bench-marks";
import { SimLayout } from "@/lab/shared-ui/sim-layout";
import { TransportBar } from "@/lab/shared-ui/transport-bar";
import { useAnimationFrame } from "@/lab/shared-ui/use-animation-frame";
import { useElementWidth } from "@/lab/shared-ui/use-element-width";
import { usePrefersReducedMotion } from "@/lab/shared-ui/use-reduced-motion";
import { currentSearch, readSearchParams } from "@/lab/shared-ui/url-params";
import { IngotCanvas, type IngotCanvasHandle } from "./ingot-canvas";
import { ChvorinovChart, LastLiquidChart, ProfileChart, SegregationChart } from "./ingot-charts";
import { IngotControls } from "./ingot-controls";
import { IngotLegend } from "./ingot-legend";
import { IngotMethod } from "./ingot-method";
import { PlaybackReadout, type ReadoutUpdate } from "./playback-readout";
import { CarbidePanel, FreezingPanel } from "./ingot-panels";
import { useIngotRun } from "./use-ingot-run";

// The charts and panels depend only on the finished run: skip them when progress or the clock re-renders.
const MemoSegregationChart = memo(SegregationChart);
const MemoLastLiquidChart = memo(LastLiquidChart);
const MemoProfileChart = memo(ProfileChart);
const MemoChvorinovChart = memo(ChvorinovChart);
const MemoCarbidePanel = memo(CarbidePanel);
const MemoFreezingPanel = memo(FreezingPanel);
const MemoIngotMethod = memo(IngotMethod);
const MemoIngotLegend = memo(IngotLegend);
const MemoIngotControls = memo(IngotControls);

export interface IngotSimulationProps {
  /** Initial parameters, e.g. a lesson's preset; names as in content/AUTHORING.md. */
  initial?: Record<string, unknown>;
  /** Called with the current parameters (contract names) whenever they change. */
  onParamsChange?: (params: Record<string, unknown>) => void;
}

/** Real seconds the whole freeze takes to play at 1×. */
const PLAYBACK_S = 20;
const SPEEDS = [0.25, 0.5, 1, 2, 4] as const;
const SUMMARY_INTERVAL_MS = 250;

function resolveInitial(initial: Record<string, unknown> | undefined): { sim: ResolvedIngotSimParams; error: string | null } {
  const raw = initial ?? readSearchParams(currentSearch(), paramsSchema);
  const parsed = paramsSchema.safeParse(raw);
  if (parsed.success) return { sim: resolveIngotSimParams(parsed.data), error: null };
  return { sim: resolveIngotSimParams(paramsSchema.parse({})), error: z.prettifyError(parsed.error) };
}

const reducedMotionNow = () => typeof window !== "undefined" && window.matchMedia?.("(prefers-reduced-motion: reduce)").matches === true;

export default function IngotSimulation({ initial, onParamsChange }: IngotSimulationProps) {
  const [{ sim: startSim, error: presetError }] = useState(() => resolveInitial(initial));
  const [sim, setSim] = useState(startSim);
  const reducedMotion = usePrefersReducedMotion();
  const { run, computing, progress, sweep, error } = useIngotRun(sim);
  const [playing, setPlaying] = useState(false);
  const [speed, setSpeed] = useState(1);
  const [wrapRef, width] = useElementWidth<HTMLDivElement>();
  const canvasRef = useRef<IngotCanvasHandle>(null);
  const element: IngotElement = sim.element;
  const onParamsChangeRef = useRef(onParamsChange);
  onParamsChangeRef.current = onParamsChange;
  useEffect(() => {
    onParamsChangeRef.current?.(toIngotParams(sim) as Record<string, unknown>);
  }, [sim]);

  // Playback state lives in refs: the animation loop mutates the frame buffers and redraws the
  // canvas directly; the summary and time slider update themselves (~4 Hz) through PlaybackReadout.
  const timeRef = useRef(0);
  const frameRef = useRef<IngotFrameView | null>(null);
  const frontsRef = useRef<Fronts>({ solidusFrontM: 0, liquidusFrontM: 0, sectionSolidFraction: 0 });
  const readoutRef = useRef<ReadoutUpdate | null>(null);
  const registerReadout = useCallback((update: ReadoutUpdate | null) => {
    readoutRef.current = update;
  }, []);
  const lastSummary = useRef(0);

  const paint = useCallback(
    (force = false) => {
      if (!run) return;
      if (!frameRef.current || frameRef.current.tempC.length !== run.cells) frameRef.current = createFrameView(run.cells);
      const frame = measured("ingot:frame", () => readFrame(run, timeRef.current, element, frameRef.current!));
      frontsRef.current = findFronts(frame.solidFraction, run.positionM, run.radiusM);
      canvasRef.current?.redraw();
      const now = performance.now();
      if (force || now - lastSummary.current > SUMMARY_INTERVAL_MS) {
        lastSummary.current = now;
        readoutRef.current?.(describeIngotFrame(run, frame, frontsRef.current, element), frame.timeS);
      }
    },
    [run, element],
  );

  // A new run starts from pouring (or, with reduced motion, shows the frozen ingot).
  useEffect(() => {
    if (!run) return;
    const still = reducedMotionNow();
    timeRef.current = still ? run.totalTimeS : 0;
    setPlaying(!still);
    paint(true);
  }, [run, paint]);

  useEffect(() => {
    if (reducedMotion) setPlaying(false);
  }, [reducedMotion]);

  useAnimationFrame(playing && run !== null, (dtS) => {
    if (!run) return;
    const rate = (run.totalTimeS / PLAYBACK_S) * speed;
    timeRef.current = Math.min(run.totalTimeS, timeRef.current + dtS * rate);
    const atEnd = timeRef.current >= run.totalTimeS;
    paint(atEnd);
    if (atEnd) setPlaying(false);
  });

  const stepOnce = () => {
    if (!run) return;
    timeRef.current = Math.min(run.totalTimeS, timeRef.current + run.totalTimeS / 40);
    paint(true);
  };
  const reset = () => {
    timeRef.current = 0;
    setPlaying(false);
    paint(true);
  };
  const seek = (timeS: number) => {
    timeRef.current = timeS;
    paint(true);
  };

  const frame = frameRef.current;
  const canvasWidth = Math.max(240, Math.min(width, 720));
  const formatSpeed = useMemo(
    () => (s: number) => (run ? `${s}× (${formatDuration((run.totalTimeS / PLAYBACK_S) * s)} per s)` : `${s}×`),
    [run],
  );

  const stage = (
    <>
      {presetError ? (
        <Alert tone="danger" title="The preset could not be used; the defaults are shown">
          <pre className="whitespace-pre-wrap text-xs">{presetError}</pre>
        </Alert>
      ) : null}
      {error ? <Alert tone="danger" title="The model could not run for these inputs">{error}</Alert> : null}
      <div ref={wrapRef} className="relative min-h-[240px] w-full">
        {run && frame && width > 0 ? (
          <IngotCanvas
            ref={canvasRef}
            run={run}
            frame={frame}
            frontsRef={frontsRef}
            element={element}
            mould={run.sim.mould}
            widthPx={canvasWidth}
            stale={computing}
          />
        ) : null}
        {computing ? (
          <div className="absolute left-3 top-10 rounded-sm bg-soot-950/85 px-3 py-2 text-sm text-bone-50" role="status">
            Computing the ingot… {Math.round(progress * 100)} % of the section solid
            <progress className="mt-1 block h-1.5 w-48 accent-ember-400" max={1} value={progress} aria-label="Solver progress" />
          </div>
        ) : null}
      </div>
      <MemoIngotLegend run={run} element={element} />
      <TransportBar
        playing={playing}
        onPlayPause={() => {
          if (!run) return;
          if (!playing && timeRef.current >= run.totalTimeS) timeRef.current = 0;
          setPlaying(!playing);
        }}
        onStep={stepOnce}
        onReset={reset}
        speed={speed}
        speeds={SPEEDS}
        onSpeed={setSpeed}
        formatSpeed={formatSpeed}
        disabled={!run}
      />
      <PlaybackReadout
        register={registerReadout}
        totalTimeS={run?.totalTimeS ?? null}
        onSeek={(t) => {
          setPlaying(false);
          seek(t);
        }}
      />
    </>
  );

  return (
    <SimLayout
      label="Ingot freezing simulation"
      stage={stage}
      controls={<MemoIngotControls sim={sim} onChange={setSim} />}
      footer={
        run ? (
          <>
            <div className="grid gap-4 @3xl:grid-cols-2">
              <MemoSegregationChart run={run} element={element} />
              <MemoLastLiquidChart run={run} />
            </div>
            <div className="grid gap-4 @3xl:grid-cols-3">
              <MemoProfileChart run={run} quantity="localFreezingTimeS" />
              <MemoProfileChart run={run} quantity="coolingRateCPerS" />
              <MemoProfileChart run={run} quantity="armSpacingUm" />
            </div>
            <div className="grid gap-4 @3xl:grid-cols-2 @3xl:items-start">
              <div className="space-y-4">
                <MemoCarbidePanel run={run} />
                <MemoChvorinovChart sweep={sweep} run={run} />
              </div>
              <MemoFreezingPanel run={run} />
            </div>
            <MemoIngotMethod />
          </>
        ) : (
          <MemoIngotMethod />
        )
      }
    />
  );
}

