import { useCallback, useEffect, useRef, useState } from "react";
import {
  cloneState,
  initialState,
  setEnvironment,
  type PassiveFilmParams,
  type PassiveFilmState,
} from "@shared/sim/passive-film";
import { PassiveFilmWorker } from "./worker-client";

/** The parameters that change the alloy itself (and so need a new lattice). */
function structuralKey(p: PassiveFilmParams): string {
  return JSON.stringify([p.crMassPct, p.cMassPct, p.carbide, p.lattice, p.neighbours, p.connectivity, p.seed]);
}

export interface SurfaceModel {
  /** The live, mutable simulation state (a new object after every rebuild or reset). */
  state: PassiveFilmState | null;
  building: boolean;
  error: string | null;
  /** Restore the surface as it was at model time 0. */
  reset: () => void;
}

/**
 * Builds the surface in a Web Worker whenever a structural parameter changes (debounced), keeps a
 * pristine copy for Reset, and applies environment changes in place (the lattice does not depend on it).
 */
export function useSurfaceModel(params: PassiveFilmParams): SurfaceModel {
  const [state, setState] = useState<PassiveFilmState | null>(null);
  const [building, setBuilding] = useState(true);
  const [error, setError] = useState<string | null>(null);
  const pristine = useRef<PassiveFilmState | null>(null);
  const worker = useRef<PassiveFilmWorker | null>(null);
  const paramsRef = useRef(params);
  paramsRef.current = params;

  useEffect(() => {
    try {
      worker.current = new PassiveFilmWorker();
    } catch {
      worker.current = null; // No worker support: build on the main thread instead.
    }
    return () => worker.current?.dispose();
  }, []);

  const key = structuralKey(params);
  useEffect(() => {
    let cancelled = false;
    setBuilding(true);
    const timer = window.setTimeout(async () => {
      try {
        const request = { ...paramsRef.current };
        const built = worker.current ? (await worker.current.init(request)).state : initialState(request);
        if (cancelled) return;
        if (built.params.environment !== paramsRef.current.environment) setEnvironment(built, paramsRef.current.environment);
        built.params = { ...paramsRef.current };
        pristine.current = cloneState(built);
        setError(null);
        setState(built);
        setBuilding(false);
      } catch (err) {
        if (cancelled || (err instanceof Error && err.message === "cancelled")) return;
        setError(err instanceof Error ? err.message : String(err));
        setBuilding(false);
      }
    }, 120);
    return () => {
      cancelled = true;
      window.clearTimeout(timer);
    };
  }, [key]);

  // Environment and view changes do not rebuild the lattice.
  useEffect(() => {
    if (state && state.params.environment !== params.environment) {
      setEnvironment(state, params.environment);
      if (pristine.current) setEnvironment(pristine.current, params.environment);
    }
    if (state) state.params = { ...state.params, view: params.view };
  }, [state, params.environment, params.view]);

  const reset = useCallback(() => {
    if (pristine.current) setState(cloneState(pristine.current));
  }, []);

  return { state, building, error, reset };
}
