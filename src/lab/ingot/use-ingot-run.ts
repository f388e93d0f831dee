import { useEffect, useRef, useState } from "react";
import type { ResolvedIngotSimParams } from "@shared/sim/ingot/params";
import type { IngotRun } from "@shared/sim/ingot/run";
import type { SweepPoint } from "@shared/sim/ingot/chvorinov-sweep";
import type { IngotWorkerRequest, IngotWorkerResponse } from "./worker-protocol";

export interface IngotRunState {
  /** The latest finished run (kept on screen while a newer one computes). */
  run: IngotRun | null;
  /** True while the run for the current parameters is being computed. */
  computing: boolean;
  /** Solid fraction reached by the run being computed (progress, 0–1). */
  progress: number;
  sweep: SweepPoint[] | null;
  error: string | null;
  computeMs: number | null;
}

/**
 * Keeps a Web Worker computing the ingot for the current parameters. A parameter change posts a
 * new request; the worker drops the old one. Results arrive as transferred typed arrays.
 */
export function useIngotRun(sim: ResolvedIngotSimParams): IngotRunState {
  const workerRef = useRef<Worker | null>(null);
  const idRef = useRef(0);
  const [state, setState] = useState<IngotRunState>({ run: null, computing: true, progress: 0, sweep: null, error: null, computeMs: null });

  useEffect(() => {
    const worker = new Worker(new URL("./ingot.worker.ts", import.meta.url), { type: "module", name: "ingot-solver" });
    workerRef.current = worker;
    worker.onmessage = (event: MessageEvent<IngotWorkerResponse>) => {
      const message = event.data;
      if (message.id !== idRef.current) return;
      setState((old) => {
        switch (message.type) {
          case "progress":
            return { ...old, progress: message.solidFraction };
          case "result":
            if (window.__simBench) (window as unknown as { __ingotTimings?: unknown[] }).__ingotTimings?.push({ computeMs: message.computeMs, busyMs: message.busyMs });
            return { ...old, run: message.run, computing: false, progress: 1, error: null, computeMs: message.computeMs };
          case "sweep":
            return { ...old, sweep: message.points };
          case "error":
            return { ...old, computing: false, error: message.message };
        }
      });
    };
    return () => {
      worker.terminate();
      workerRef.current = null;
    };
  }, []);

  // The mapped element only changes the drawing, not the run.
  const { element: _element, ...runInputs } = sim;
  const key = JSON.stringify(runInputs);
  useEffect(() => {
    const worker = workerRef.current;
    if (!worker) return;
    idRef.current += 1;
    const request: IngotWorkerRequest = { type: "run", id: idRef.current, sim: { ...JSON.parse(key), element: "C" } };
    setState((old) => ({ ...old, computing: true, progress: 0, sweep: null, error: null }));
    if (typeof performance !== "undefined" && typeof window !== "undefined" && window.__simBench) performance.mark(`ingot-request-${idRef.current}`);
    worker.postMessage(request);
  }, [key]);

  return state;
}
