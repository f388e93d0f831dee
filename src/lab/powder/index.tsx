import { memo, useEffect, useMemo, useRef, useState } from "react";
import { z } from "zod";
import { paramsSchema, resolvePowderParams, type ResolvedPowderParams } from "@shared/sim/powder/params";
import { createTower, primeTower, stepTower, towerLayout, type TowerState } from "@shared/sim/powder/tower";
import { hipOutcome } from "@shared/sim/powder/hip-model";
import { describePowder } from "@shared/sim/powder/summary";
import { formatNumber } from "@shared/sim/alloy/format";
import { Alert } from "@/components/ui/alert";
import { measured } from "@/lab/shared-ui/bench-marks";
import { glowGradient } from "@/lab/shared-ui/incandescence";
import { Legend } from "@/lab/shared-ui/legend";
import { LiveSummary } from "@/lab/shared-ui/live-summary";
import { SimLayout } from "@/lab/shared-ui/sim-layout";
import { TransportBar } from "@/lab/shared-ui/transport-bar";
import { useAnimationFrame } from "@/lab/shared-ui/use-animation-frame";
import { useElementWidth } from "@/lab/shared-ui/use-element-width";
import { usePrefersReducedMotion } from "@/lab/shared-ui/use-reduced-motion";
import { currentSearch, readSearchParams } from "@/lab/shared-ui/url-params";
import { ClassTable } from "./class-table";
import { CoolingRateChart, HipChart, SizeHistogram } from "./powder-charts";
import { PowderControls } from "./powder-controls";
import { PowderMethod } from "./powder-method";
import { RouteComparisonPanel } from "./route-comparison";
import { TowerCanvas, type TowerCanvasHandle } from "./tower-canvas";
import { usePowderRun } from "./use-powder-run";
import type { PowderRunInputs } from "./worker-protocol";

export interface PowderSimulationProps {
  /** Initial parameters, e.g. a lesson's preset; names as in content/AUTHORING.md. */
  initial?: Record<string, unknown>;
  /** Called with the current parameters (contract names) whenever they change. */
  onParamsChange?: (params: Record<string, unknown>) => void;
}

const SPEEDS = [0.25, 0.5, 1, 2] as const;

const MemoSizeHistogram = memo(SizeHistogram);
const MemoCoolingRateChart = memo(CoolingRateChart);
const MemoClassTable = memo(ClassTable);
const MemoHipChart = memo(HipChart);
const MemoRouteComparison = memo(RouteComparisonPanel);
const MemoPowderMethod = memo(PowderMethod);

function resolveInitial(initial: Record<string, unknown> | undefined): { params: ResolvedPowderParams; error: string | null } {
  const raw = initial ?? readSearchParams(currentSearch(), paramsSchema);
  const parsed = paramsSchema.safeParse(raw);
  if (parsed.success) return { params: resolvePowderParams(parsed.data), error: null };
  return { params: resolvePowderParams(paramsSchema.parse({})), error: z.prettifyError(parsed.error) };
}

const reducedMotionNow = () => typeof window !== "undefined" && window.matchMedia?.("(prefers-reduced-motion: reduce)").matches === true;

export default function PowderSimulation({ initial, onParamsChange }: PowderSimulationProps) {
  const [{ params: start, error: presetError }] = useState(() => resolveInitial(initial));
  const [params, setParams] = useState(start);
  const { hipPressureMPa, hipTempC, ...atomising } = params;
  const inputsKey = JSON.stringify(atomising);
  // Stable identity while only the HIP controls move, so the memoised charts skip re-rendering.
  const inputs: PowderRunInputs = useMemo(() => JSON.parse(inputsKey) as PowderRunInputs, [inputsKey]);
  const { result, comparison, computing, progress, stage, error } = usePowderRun(inputs);
  const reducedMotion = usePrefersReducedMotion();
  const [playing, setPlaying] = useState(false);
  const [speed, setSpeed] = useState(1);
  const [wrapRef, width] = useElementWidth<HTMLDivElement>();
  const canvasRef = useRef<TowerCanvasHandle>(null);
  const towerRef = useRef<TowerState>(createTower());

  const onParamsChangeRef = useRef(onParamsChange);
  onParamsChangeRef.current = onParamsChange;
  useEffect(() => {
    const { composition: _composition, ...contract } = params;
    onParamsChangeRef.current?.(contract);
  }, [params]);

  const layout = useMemo(() => (result ? towerLayout(result.classes) : null), [result]);
  const hip = useMemo(() => hipOutcome(hipPressureMPa, hipTempC), [hipPressureMPa, hipTempC]);

  // New droplet classes: refill the tower so it never starts empty.
  useEffect(() => {
    if (!layout) return;
    const tower = createTower();
    primeTower(tower, layout);
    towerRef.current = tower;
    canvasRef.current?.redraw();
    setPlaying(!reducedMotionNow());
  }, [layout]);

  useEffect(() => {
    if (reducedMotion) setPlaying(false);
  }, [reducedMotion]);

  useAnimationFrame(playing && layout !== null, (dtS) => {
    if (!layout) return;
    measured("powder:step", () => stepTower(towerRef.current, layout, dtS * layout.modelSecondsPerSecond * speed));
    canvasRef.current?.redraw();
  });

  const summary = result ? describePowder(params, result, comparison, hip) : "Computing the droplets…";
  const canvasWidth = Math.max(260, Math.min(width, 720));
  const comparisonStale = comparison !== null && JSON.stringify(comparison.ingotRun.sim.composition) !== JSON.stringify(params.composition);
  const gasLabel = params.gas === "N2" ? "N₂" : "Ar";

  const stage_ = (
    <>
      {presetError ? (
        <Alert tone="danger" title="The preset could not be used; the defaults are shown">
          <pre className="whitespace-pre-wrap text-xs">{presetError}</pre>
        </Alert>
      ) : null}
      {error ? <Alert tone="danger" title="The droplet model could not run for these inputs">{error}</Alert> : null}
      <div ref={wrapRef} className="relative min-h-[260px] w-full">
        {result && layout && width > 0 ? (
          <TowerCanvas ref={canvasRef} classes={result.classes} layout={layout} towerRef={towerRef} gasLabel={gasLabel} widthPx={canvasWidth} stale={computing} />
        ) : null}
        {computing ? (
          <div className="absolute left-14 top-20 rounded-sm bg-soot-950/85 px-3 py-2 text-sm text-bone-50" role="status">
            Following the droplets… {Math.round(progress * 100)} % of the size classes
            <progress className="mt-1 block h-1.5 w-48" max={1} value={stage === "droplets" ? progress : 0} aria-label="Droplet model progress" />
          </div>
        ) : null}
      </div>
      <div className="grid gap-3 rounded-md border border-bone-300 bg-white p-3 @xl:grid-cols-2">
        <div>
          <p className="eyebrow text-[0.65rem] text-soot-600">Droplet colour: temperature</p>
          <div className="mt-1.5 h-4 rounded-xs border border-soot-700/40" style={{ background: glowGradient(20, 1600) }} aria-hidden="true" />
          <p className="mt-1 flex justify-between font-mono text-xs text-soot-700">
            <span>20 °C</span>
            <span>1600 °C</span>
          </p>
          {result ? (
            <p className="text-xs text-soot-700">
              Leaves the nozzle at {Math.round(result.initialTempC)} °C; nucleates at {Math.round(result.nucleationTempC)} °C; liquidus{" "}
              {Math.round(result.liquidusC)} °C.
            </p>
          ) : null}
        </div>
        <Legend
          title="Droplet marks"
          columns={1}
          items={[
            { key: "liquid", label: "Liquid", detail: "plain disc", swatch: { fill: "#ffd67c", shape: "circle" } },
            { key: "freezing", label: "Freezing", detail: "light ring around the disc", swatch: { fill: "#ffad45", shape: "circle", pattern: "dashed-ring", patternColor: "#1a1714" } },
            { key: "solid", label: "Solid", detail: "dark outline", swatch: { fill: "#b82a0c", shape: "circle", stroke: "#0f0d0b" } },
          ]}
        />
      </div>
      <TransportBar
        playing={playing}
        onPlayPause={() => setPlaying(!playing)}
        onStep={() => {
          if (!layout) return;
          stepTower(towerRef.current, layout, layout.modelSecondsPerSecond / 10);
          canvasRef.current?.redraw();
        }}
        onReset={() => {
          if (!layout) return;
          towerRef.current = createTower();
          setPlaying(false);
          canvasRef.current?.redraw();
        }}
        speed={speed}
        speeds={SPEEDS}
        onSpeed={setSpeed}
        formatSpeed={(s) => (layout ? `${s}× (${formatNumber(layout.modelSecondsPerSecond * s * 1000, 2)} ms per s)` : `${s}×`)}
        disabled={!layout}
      />
      <LiveSummary text={summary} />
    </>
  );

  return (
    <SimLayout
      label="Gas-atomised powder simulation"
      stage={stage_}
      controls={<PowderControls params={params} onChange={setParams} />}
      footer={
        <>
          {result ? (
            <>
              <div className="grid gap-4 @3xl:grid-cols-2">
                <MemoSizeHistogram result={result} inputs={inputs} />
                <MemoCoolingRateChart result={result} inputs={inputs} />
              </div>
              <MemoClassTable result={result} />
            </>
          ) : null}
          <div className="grid gap-4 @3xl:grid-cols-2">
            <MemoRouteComparison composition={params.composition} comparison={comparison} updating={comparisonStale || stage === "ingot"} widthPx={Math.min(width, 560)} />
            <div className="space-y-3">
              <MemoHipChart pressureMPa={hipPressureMPa} tempC={hipTempC} outcome={hip} />
              <HipFacts outcome={hip} />
            </div>
          </div>
          <MemoPowderMethod />
        </>
      }
    />
  );
}

function HipFacts({ outcome }: { outcome: ReturnType<typeof hipOutcome> }) {
  return (
    <div className="rounded-md border border-bone-300 bg-white p-3 text-sm">
    <dl className="grid grid-cols-2 gap-3">
      <div>
        <dt className="text-xs text-soot-600">Density after yielding</dt>
        <dd className="font-mono text-base font-semibold">{formatNumber(outcome.relativeDensity * 100, 3)} %</dd>
      </div>
      <div>
        <dt className="text-xs text-soot-600">Can shrinkage (linear)</dt>
        <dd className="font-mono text-base font-semibold">{formatNumber(outcome.linearShrinkage * 100, 3)} %</dd>
      </div>
      <div>
        <dt className="text-xs text-soot-600">To full density</dt>
        <dd className="font-mono text-base font-semibold">{formatNumber(outcome.fullDensityShrinkage * 100, 3)} %</dd>
      </div>
      <div>
        <dt className="text-xs text-soot-600">Stage</dt>
        <dd className="text-sm font-semibold">{outcome.stage === 1 ? "1 — necks between particles" : "2 — isolated pores"}</dd>
      </div>
    </dl>
    <p className="mt-2 text-xs text-soot-600">The last porosity closes by creep and diffusion during the hold, which this model does not follow.</p>
    </div>
  );
}
