/** The steels a student can pick: the core's grade presets and their own saved alloys. */
import type { SavedAlloy } from "@shared/api/alloys";
import { alloySteelKey, gradeSteelKey, parseSteelKey } from "@shared/api/notebook";
import { GRADE_PRESETS, type Composition } from "@shared/metallurgy";

export interface SteelOption {
  key: string;
  label: string;
  description: string;
  composition: Composition;
}

export function gradeOptions(): SteelOption[] {
  return GRADE_PRESETS.map((g) => ({ key: gradeSteelKey(g.id), label: g.label, description: g.description, composition: g.composition }));
}

export function alloyOptions(alloys: readonly SavedAlloy[]): SteelOption[] {
  return alloys.map((a) => ({ key: alloySteelKey(a.id), label: a.name, description: "Your saved alloy from the alloy explorer.", composition: a.composition as Composition }));
}

/** The option for a key, if the grade exists or the alloy is in the list. */
export function findSteel(key: string, alloys: readonly SavedAlloy[]): SteelOption | undefined {
  if (!key) return undefined;
  const parsed = parseSteelKey(key);
  return parsed.source === "grade" ? gradeOptions().find((o) => o.key === key) : alloyOptions(alloys).find((o) => o.key === key);
}

/** "C 1.00 · Cr 1.45 · Mn 0.35" */
export function formatComposition(composition: Composition | Record<string, number>): string {
  return Object.entries(composition)
    .filter(([, v]) => typeof v === "number" && v > 0)
    .map(([el, v]) => `${el} ${(v as number).toFixed(2)}`)
    .join(" · ");
}
