/// <reference lib="webworker" />
// Samples the carbide field (thousands of non-overlapping particles), the preset scatter and the
// strokes-to-restore comparison off the main thread.
import { ABRASIVES } from "@shared/metallurgy";
import { baseFieldFor, presetScatter, STONE_ABRASIVE, strokesToRestore, type StoneId } from "@shared/sim/carbides";
import { baseBuffers, type CarbideWorkerRequest, type CarbideWorkerResponse } from "./worker-protocol";

const scope = self as unknown as DedicatedWorkerGlobalScope;

scope.onmessage = (event: MessageEvent<CarbideWorkerRequest>) => {
  const req = event.data;
  const post = (message: CarbideWorkerResponse, transfer: Transferable[] = []) => scope.postMessage(message, transfer);
  try {
    if (req.kind === "base") {
      const start = performance.now();
      const base = baseFieldFor(req.params);
      post({ id: req.id, kind: "base", base, computeMs: performance.now() - start }, baseBuffers(base));
    } else if (req.kind === "scatter") {
      post({ id: req.id, kind: "scatter", points: presetScatter(req.state, req.stone) });
    } else {
      const strokes = {} as Record<StoneId, number | null>;
      for (const stone of Object.keys(STONE_ABRASIVE) as StoneId[]) {
        strokes[stone] = strokesToRestore(req.edge, ABRASIVES[STONE_ABRASIVE[stone]].typicalHv, 6000, 5);
      }
      post({ id: req.id, kind: "restore", strokes });
    }
  } catch (err) {
    post({ id: req.id, kind: "error", message: err instanceof Error ? err.message : String(err) });
  }
};
