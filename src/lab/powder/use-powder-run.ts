import { useEffect, useRef, useState } from "react";
import type { PowderClasses } from "@shared/sim/powder/classes";
import type { RouteComparison } from "@shared/sim/powder/comparison";
import type { PowderRunInputs, PowderWorkerRequest, PowderWorkerResponse } from "./worker-protocol";

export interface PowderRunState {
  result: PowderClasses | null;
  comparison: RouteComparison | null;
  computing: boolean;
  progress: number;
  stage: "droplets" | "ingot" | null;
  error: string | null;
  computeMs: number | null;
}

/** Keeps a Web Worker computing the droplet classes (and the comparison ingot) for the current inputs. */
export function usePowderRun(inputs: PowderRunInputs): PowderRunState {
  const workerRef = useRef<Worker | null>(null);
  const idRef = useRef(0);
  const [state, setState] = useState<PowderRunState>({ result: null, comparison: null, computing: true, progress: 0, stage: "droplets", error: null, computeMs: null });

  useEffect(() => {
    const worker = new Worker(new URL("./powder.worker.ts", import.meta.url), { type: "module", name: "powder-model" });
    workerRef.current = worker;
    worker.onmessage = (event: MessageEvent<PowderWorkerResponse>) => {
      const m = event.data;
      if (m.id !== idRef.current) return;
      setState((old) => {
        switch (m.type) {
          case "progress":
            return { ...old, progress: m.fraction, stage: m.stage };
          case "classes":
            if (window.__simBench) (window as unknown as { __powderTimings?: unknown[] }).__powderTimings?.push({ stage: "droplets", computeMs: m.computeMs });
            return { ...old, result: m.result, computing: false, stage: "ingot", progress: 0, error: null, computeMs: m.computeMs };
          case "comparison":
            if (window.__simBench) (window as unknown as { __powderTimings?: unknown[] }).__powderTimings?.push({ stage: "ingot", computeMs: m.computeMs });
            return { ...old, comparison: m.comparison, stage: null };
          case "error":
            return { ...old, computing: false, stage: null, error: m.message };
        }
      });
    };
    return () => {
      worker.terminate();
      workerRef.current = null;
    };
  }, []);

  const key = JSON.stringify(inputs);
  useEffect(() => {
    const worker = workerRef.current;
    if (!worker) return;
    idRef.current += 1;
    const request: PowderWorkerRequest = { type: "run", id: idRef.current, inputs: JSON.parse(key) };
    setState((old) => ({ ...old, computing: true, progress: 0, stage: "droplets", error: null }));
    worker.postMessage(request);
  }, [key]);

  return state;
}
