import type { PassiveFilmParams, PassiveFilmState, SpanningCurveForModel, SpanningModel } from "@shared/sim/passive-film";

export type WorkerRequest =
  | { id: number; kind: "init"; params: PassiveFilmParams }
  | { id: number; kind: "spanning"; model: SpanningModel; samples: number; seed: number };

export type WorkerResponse =
  | { id: number; kind: "init"; state: PassiveFilmState; computeMs: number }
  | { id: number; kind: "progress"; fractionDone: number }
  | { id: number; kind: "spanning"; result: SpanningCurveForModel; computeMs: number }
  | { id: number; kind: "error"; message: string };

/** The typed-array buffers of a state, moved (not copied) between threads. */
export function stateBuffers(state: PassiveFilmState): ArrayBuffer[] {
  return [
    state.kind, state.haloMask, state.network, state.protectedMask, state.status, state.sinceS,
    state.scratchMask, state.changed, state.live, state.liveFlag, state.pendingStatus,
  ].map((a) => a.buffer as ArrayBuffer);
}
