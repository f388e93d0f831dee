/// <reference lib="webworker" />
/**
 * Computes the droplet flights of every size class and the comparison ingot off the main
 * thread. The droplets come first (the tower can start as soon as they are ready); the ingot
 * follows. A newer request makes the worker drop the older one between classes.
 */
import { computePowderClasses } from "@shared/sim/powder/classes";
import { compareRoutes } from "@shared/sim/powder/comparison";
import type { PowderWorkerRequest, PowderWorkerResponse } from "./worker-protocol";

const scope = self as unknown as DedicatedWorkerGlobalScope;
let latest = 0;
let lastComparisonKey = "";
let lastComparison: PowderWorkerResponse | null = null;

scope.onmessage = (event: MessageEvent<PowderWorkerRequest>) => {
  if (event.data.type !== "run") return;
  latest = event.data.id;
  void run(event.data);
};

const post = (m: PowderWorkerResponse) => scope.postMessage(m);
const yieldToEvents = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

async function run({ id, inputs }: PowderWorkerRequest): Promise<void> {
  try {
    await yieldToEvents(); // let a burst of slider events collapse into the newest one
    if (id !== latest) return;
    const start = performance.now();
    const result = computePowderClasses({ ...inputs, hipPressureMPa: 100, hipTempC: 1150 }, (done, total) => {
      post({ type: "progress", id, fraction: done / total, stage: "droplets" });
    });
    if (id !== latest) return;
    post({ type: "classes", id, result, computeMs: performance.now() - start });
    // The ingot depends on the composition only: reuse it while the grade is unchanged.
    const comparisonKey = JSON.stringify(inputs.composition);
    await yieldToEvents();
    if (id !== latest) return;
    const ingotStart = performance.now();
    post({ type: "progress", id, fraction: 0, stage: "ingot" });
    const ingotRun = comparisonKey === lastComparisonKey && lastComparison?.type === "comparison" ? lastComparison.comparison.ingotRun : undefined;
    const comparison = compareRoutes(inputs.composition, result.classes, ingotRun);
    if (id !== latest) return;
    lastComparisonKey = comparisonKey;
    lastComparison = { type: "comparison", id, comparison, computeMs: performance.now() - ingotStart };
    post(lastComparison);
  } catch (error) {
    post({ type: "error", id, message: error instanceof Error ? error.message : String(error) });
  }
}
