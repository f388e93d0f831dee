import type { ResolvedPowderParams } from "@shared/sim/powder/params";
import type { PowderClasses } from "@shared/sim/powder/classes";
import type { RouteComparison } from "@shared/sim/powder/comparison";

/** Atomisation inputs only: the HIP controls are computed on the main thread and do not rerun the worker. */
export type PowderRunInputs = Omit<ResolvedPowderParams, "hipPressureMPa" | "hipTempC">;

export type PowderWorkerRequest = { type: "run"; id: number; inputs: PowderRunInputs };

export type PowderWorkerResponse =
  | { type: "progress"; id: number; fraction: number; stage: "droplets" | "ingot" }
  | { type: "classes"; id: number; result: PowderClasses; computeMs: number }
  | { type: "comparison"; id: number; comparison: RouteComparison; computeMs: number }
  | { type: "error"; id: number; message: string };
