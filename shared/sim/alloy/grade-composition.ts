import type { Composition, Element } from "../../metallurgy/composition";
import { findGrade, GRADE_PRESETS } from "../../metallurgy/grades";

/** Ids of the grade presets, for zod enums and select controls. */
export function gradeIds(): string[] {
  return GRADE_PRESETS.map((g) => g.id);
}

export function isGradeId(id: string): boolean {
  return findGrade(id) !== undefined;
}

/**
 * The composition a simulation uses: the grade's nominal composition (or `fallbackGradeId`'s
 * when no grade and no element is given), then every element the author set explicitly on top.
 * When elements are set without a grade the alloy is exactly what was typed (missing = 0),
 * so `{ C: 1, V: 4 }` means a 1 % C, 4 % V steel and not "the default grade with 4 % V".
 */
export function resolveComposition(
  input: { grade?: string } & Partial<Record<Element, number | undefined>>,
  elements: readonly Element[],
  fallbackGradeId: string,
): { composition: Composition; gradeId: string | null } {
  const explicit: Composition = {};
  for (const el of elements) {
    const v = input[el];
    if (typeof v === "number") explicit[el] = v;
  }
  const hasExplicit = Object.keys(explicit).length > 0;
  const gradeId = input.grade ?? (hasExplicit ? null : fallbackGradeId);
  const base: Composition = gradeId ? { ...(findGrade(gradeId)?.composition ?? {}) } : {};
  const composition: Composition = {};
  for (const el of elements) {
    const v = explicit[el] ?? base[el];
    if (v !== undefined && v > 0) composition[el] = v;
  }
  // An override of a grade makes it a different alloy: report it as custom.
  const modified = gradeId !== null && hasExplicit && elements.some((el) => explicit[el] !== undefined && explicit[el] !== (base[el] ?? 0));
  return { composition, gradeId: modified ? null : gradeId };
}
