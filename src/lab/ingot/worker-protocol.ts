import type { ResolvedIngotSimParams } from "@shared/sim/ingot/params";
import type { IngotRun } from "@shared/sim/ingot/run";
import type { SweepPoint } from "@shared/sim/ingot/chvorinov-sweep";

/** Messages between the ingot view and its worker. Each run has an id; newer ids supersede older ones. */
export type IngotWorkerRequest = { type: "run"; id: number; sim: ResolvedIngotSimParams };

export type IngotWorkerResponse =
  | { type: "progress"; id: number; solidFraction: number }
  | { type: "result"; id: number; run: IngotRun; computeMs: number; busyMs: number }
  | { type: "sweep"; id: number; points: SweepPoint[]; computeMs: number }
  | { type: "error"; id: number; message: string };
