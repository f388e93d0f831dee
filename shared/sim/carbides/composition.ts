import { findGrade, type Composition } from "../../metallurgy";
import { DEFAULT_AUSTENITIZING_TEMP_C, TYPICAL_AUSTENITIZING_TEMP_C } from "./constants";
import type { CarbideParams } from "./params";

export interface ResolvedAlloy {
  composition: Composition;
  /** "AISI D2", or "Custom steel" when elements were set by hand. */
  label: string;
  gradeId: string | null;
  austenitizingTempC: number;
}

const SLIDER_ELEMENTS = ["C", "Cr", "V", "W", "Mo"] as const;

/** The composition of the parameters: the grade's, with any element given explicitly overriding it. */
export function resolveAlloy(p: CarbideParams): ResolvedAlloy {
  const grade = p.grade ? findGrade(p.grade) : undefined;
  const composition: Composition = { ...(grade?.composition ?? {}) };
  let custom = !grade;
  for (const el of SLIDER_ELEMENTS) {
    const v = p[el];
    if (v === undefined) continue;
    if ((composition[el] ?? 0) !== v) custom = true;
    composition[el] = v;
  }
  const typical = grade ? TYPICAL_AUSTENITIZING_TEMP_C[grade.id] : undefined;
  return {
    composition,
    label: custom ? (grade ? `${grade.label}, modified` : "Custom steel") : grade!.label,
    gradeId: custom ? null : grade!.id,
    austenitizingTempC: p.austenitizingTempC ?? typical ?? DEFAULT_AUSTENITIZING_TEMP_C,
  };
}
