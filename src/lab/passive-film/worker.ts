/// <reference lib="webworker" />
// Builds the alloy lattice (3-D cluster labelling, tens of ms) and the spanning-probability curve
// (about a second) off the main thread, so the canvas keeps drawing at 60 frames per second.
import { initialState, spanningCurveForModel } from "@shared/sim/passive-film";
import { stateBuffers, type WorkerRequest, type WorkerResponse } from "./worker-protocol";

const scope = self as unknown as DedicatedWorkerGlobalScope;

scope.onmessage = (event: MessageEvent<WorkerRequest>) => {
  const request = event.data;
  const post = (message: WorkerResponse, transfer: Transferable[] = []) => scope.postMessage(message, transfer);
  try {
    const start = performance.now();
    if (request.kind === "init") {
      const state = initialState(request.params);
      post({ id: request.id, kind: "init", state, computeMs: performance.now() - start }, stateBuffers(state));
    } else {
      const result = spanningCurveForModel(request.model, {
        samples: request.samples,
        seed: request.seed,
        onProgress: (fractionDone) => post({ id: request.id, kind: "progress", fractionDone }),
      });
      post({ id: request.id, kind: "spanning", result, computeMs: performance.now() - start });
    }
  } catch (err) {
    post({ id: request.id, kind: "error", message: err instanceof Error ? err.message : String(err) });
  }
};
