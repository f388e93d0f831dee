import { useEffect, useRef, useState } from "react";
import type { SpanningCurveForModel, SpanningModel } from "@shared/sim/passive-film";
import { PassiveFilmWorker } from "./worker-client";

export interface SpanningCurveState {
  curve: SpanningCurveForModel | null;
  progress: number | null;
  error: string | null;
}

/** Computes (once per model, then cached) the spanning-probability curve in its own worker, with progress. */
export function useSpanningCurve(model: SpanningModel, enabled: boolean): SpanningCurveState {
  const cache = useRef(new Map<string, SpanningCurveForModel>());
  const worker = useRef<PassiveFilmWorker | null>(null);
  const key = `${model.lattice}-${model.neighbours}-${model.connectivity}`;
  const [result, setResult] = useState<SpanningCurveState>({ curve: null, progress: null, error: null });

  useEffect(() => () => worker.current?.dispose(), []);

  useEffect(() => {
    if (!enabled) return;
    const cached = cache.current.get(key);
    if (cached) { setResult({ curve: cached, progress: null, error: null }); return; }
    let cancelled = false;
    setResult({ curve: null, progress: 0, error: null });
    // A fresh worker per curve: a superseded computation is simply terminated.
    worker.current?.dispose();
    const w = new PassiveFilmWorker();
    worker.current = w;
    w.spanning({ lattice: model.lattice, neighbours: model.neighbours, connectivity: model.connectivity }, (f) => {
      if (!cancelled) setResult((r) => ({ ...r, progress: f }));
    })
      .then(({ result: curve }) => {
        cache.current.set(key, curve);
        if (!cancelled) setResult({ curve, progress: null, error: null });
      })
      .catch((err: Error) => {
        if (!cancelled && err.message !== "cancelled") setResult({ curve: null, progress: null, error: err.message });
      });
    return () => { cancelled = true; };
  }, [key, enabled, model.lattice, model.neighbours, model.connectivity]);

  return result;
}
