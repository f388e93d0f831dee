/// <reference lib="webworker" />
/**
 * Runs the ingot solver off the main thread, ahead of the display clock: the view plays back
 * recorded frames while the worker computes. Work is done in slices of about 24 ms with a
 * yield in between, so a newer request (the user moved a slider again) is seen and the
 * superseded run is dropped instead of finishing.
 */
import { createIngotRunner } from "@shared/sim/ingot/run";
import { chvorinovSweep } from "@shared/sim/ingot/chvorinov-sweep";
import type { IngotWorkerRequest, IngotWorkerResponse } from "./worker-protocol";

const scope = self as unknown as DedicatedWorkerGlobalScope;
let latest = 0;
/** Wall time per slice of solver work before the worker looks for newer requests. */
const SLICE_MS = 24;

scope.onmessage = (event: MessageEvent<IngotWorkerRequest>) => {
  const request = event.data;
  if (request.type !== "run") return;
  latest = request.id;
  void run(request);
};

function post(message: IngotWorkerResponse, transfer: Transferable[] = []): void {
  scope.postMessage(message, transfer);
}

const yieldToEvents = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

async function run({ id, sim }: IngotWorkerRequest): Promise<void> {
  try {
    const start = performance.now();
    const runner = createIngotRunner(sim);
    let busyMs = 0;
    let lastProgress = start;
    while (!runner.done) {
      const sliceStart = performance.now();
      const solidFraction = runner.advance(SLICE_MS);
      busyMs += performance.now() - sliceStart;
      if (id !== latest) return;
      // Progress at most every 100 ms: each message re-renders the progress bar on the main thread.
      if (performance.now() - lastProgress > 100) {
        lastProgress = performance.now();
        post({ type: "progress", id, solidFraction });
      }
      await yieldToEvents();
      if (id !== latest) return;
    }
    const result = runner.result();
    post({ type: "result", id, run: result, computeMs: performance.now() - start, busyMs }, transferablesOf(result));
    await yieldToEvents();
    if (id !== latest) return;
    const sweepStart = performance.now();
    const points = chvorinovSweep(sim);
    if (id !== latest) return;
    post({ type: "sweep", id, points, computeMs: performance.now() - sweepStart });
  } catch (error) {
    post({ type: "error", id, message: error instanceof Error ? error.message : String(error) });
  }
}

function transferablesOf(run: import("@shared/sim/ingot/run").IngotRun): Transferable[] {
  const buffers = new Set<ArrayBufferLike>();
  const add = (a: ArrayLike<number> | undefined) => {
    if (a && "buffer" in a) buffers.add((a as Float32Array).buffer);
  };
  [run.positionM, run.frameTimeS, run.frameTempC, run.frameSolidFraction].forEach(add);
  Object.values(run.frameMeanMassPct).forEach(add);
  Object.values(run.framePoolMassPct).forEach(add);
  const f = run.final;
  [f.localFreezingTimeS, f.coolingRateCPerS, f.armSpacingUm, f.carbideSizeUm].forEach(add);
  [f.meanMassPct, f.dendriteCoreMassPct, f.lastLiquidMassPct].forEach((m) => Object.values(m).forEach(add));
  return [...buffers] as Transferable[];
}
