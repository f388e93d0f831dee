import {
  edgeRetentionIndex,
  findGrade,
  sharpeningEffortIndex,
  wearPhasesFromCarbides,
  type AbrasiveKey,
} from "../../metallurgy";
import { CARBIDE_PRESET_GRADES, REFERENCE_GRADE, STONE_ABRASIVE, TYPICAL_AUSTENITIZING_TEMP_C } from "./constants";
import { carbidePopulation, type CarbidePopulationState } from "./population";

export type StoneId = keyof typeof STONE_ABRASIVE;

export interface WearIndices {
  /** Edge-retention index against quartz (model index, not a lifetime). */
  edgeRetention: number;
  /** Sharpening-effort index on the chosen stone (model index, not a time). */
  sharpeningEffort: number;
  /** Sharpening-effort index on every stone. */
  sharpeningEffortByStone: Record<StoneId, number>;
}

/** The core's edge-retention and sharpening-effort indices (science-reference §2.6) of a population. */
export function wearIndices(pop: CarbidePopulationState, stone: StoneId): WearIndices {
  const phases = wearPhasesFromCarbides({ phases: pop.phases }, pop.matrixHv);
  const byStone = Object.fromEntries(
    (Object.keys(STONE_ABRASIVE) as StoneId[]).map((s) => [s, sharpeningEffortIndex(phases, STONE_ABRASIVE[s] as AbrasiveKey)]),
  ) as Record<StoneId, number>;
  return { edgeRetention: edgeRetentionIndex(phases), sharpeningEffort: byStone[stone], sharpeningEffortByStone: byStone };
}

export interface GradeIndexPoint {
  gradeId: string;
  label: string;
  edgeRetention: number;
  sharpeningEffort: number;
  totalCarbideVolumePct: number;
}

/** Indices of a preset grade, hardened from its usual temperature (or annealed). */
export function gradeIndexPoint(gradeId: string, state: "annealed" | "hardened", stone: StoneId): GradeIndexPoint {
  const grade = findGrade(gradeId);
  if (!grade) throw new Error(`unknown grade ${gradeId}`);
  const pop = carbidePopulation(grade.composition, state, TYPICAL_AUSTENITIZING_TEMP_C[gradeId] ?? 1000);
  const idx = wearIndices(pop, stone);
  return { gradeId, label: grade.label, edgeRetention: idx.edgeRetention, sharpeningEffort: idx.sharpeningEffort, totalCarbideVolumePct: pop.totalCarbideVolumePct };
}

/** The plain-carbon reference (SAE 1095) in the same state. */
export function referencePoint(state: "annealed" | "hardened", stone: StoneId): GradeIndexPoint {
  return gradeIndexPoint(REFERENCE_GRADE, state, stone);
}

/** Every preset grade on the two index axes: the edge-retention vs sharpening-effort compromise. */
export function presetScatter(state: "annealed" | "hardened", stone: StoneId): GradeIndexPoint[] {
  return CARBIDE_PRESET_GRADES.map((id) => gradeIndexPoint(id, state, stone));
}
