import type { BaseField, CarbideParams, EdgeState, GradeIndexPoint, StoneId } from "@shared/sim/carbides";

export type CarbideWorkerRequest =
  | { id: number; kind: "base"; params: CarbideParams }
  | { id: number; kind: "scatter"; state: "annealed" | "hardened"; stone: StoneId }
  | { id: number; kind: "restore"; edge: EdgeState };

export type CarbideWorkerResponse =
  | { id: number; kind: "base"; base: BaseField; computeMs: number }
  | { id: number; kind: "scatter"; points: GradeIndexPoint[] }
  | { id: number; kind: "restore"; strokes: Record<StoneId, number | null> }
  | { id: number; kind: "error"; message: string };

export function baseBuffers(base: BaseField): ArrayBuffer[] {
  return [base.xUm, base.yUm, base.radiusUm, base.typeIndex, base.order].map((a) => a.buffer as ArrayBuffer);
}
