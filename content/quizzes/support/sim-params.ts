/**
 * Helpers for simulation-task checks: read the parameters a learner submitted from an embedded
 * simulation defensively (they arrive as untrusted JSON) and turn alloy specs into compositions.
 * Not a quiz: lives in a subfolder so a loader that scans content/quizzes/*.ts never mistakes it for one.
 */
import { ELEMENTS, findGrade, type Composition, type Element } from "../../../shared/metallurgy";

/** A finite number from `submitted[key]` within [min, max], or `fallback` when the key is absent. Null when invalid. */
export function readNumber(
  submitted: Record<string, unknown>,
  key: string,
  fallback: number | undefined,
  range: { min: number; max: number },
): number | null {
  const raw = submitted[key];
  if (raw === undefined || raw === null) return fallback ?? null;
  const value = typeof raw === "string" && raw.trim() !== "" ? Number(raw) : raw;
  if (typeof value !== "number" || !Number.isFinite(value)) return null;
  if (value < range.min || value > range.max) return null;
  return value;
}

/** One of `allowed` from `submitted[key]`, or `fallback` when absent; null when it is something else. */
export function readChoice<T extends string | number>(
  submitted: Record<string, unknown>,
  key: string,
  allowed: readonly T[],
  fallback: T,
): T | null {
  const raw = submitted[key];
  if (raw === undefined || raw === null) return fallback;
  const match = allowed.find((a) => a === raw || String(a) === String(raw));
  return match ?? null;
}

export interface NamedComposition {
  name: string;
  composition: Composition;
}

const ALLOY_ELEMENTS: readonly Element[] = ["C", "Cr", "V", "W", "Mo", "Mn", "Si", "Ni", "N"];

/** Composition from a `{ grade }` or `{ name?, C, Cr, ... }` object; null when it is neither. */
export function compositionFromSpec(spec: unknown): NamedComposition | null {
  if (spec === null || typeof spec !== "object") return null;
  const obj = spec as Record<string, unknown>;
  if (typeof obj.grade === "string") {
    const grade = findGrade(obj.grade);
    if (!grade) return null;
    // A grade with element overrides becomes a modified grade (as the simulations treat it).
    const composition: Composition = { ...grade.composition };
    for (const el of ALLOY_ELEMENTS) {
      const v = obj[el];
      if (typeof v === "number" && Number.isFinite(v) && v >= 0 && v <= 100) composition[el] = v;
    }
    return { name: grade.label, composition };
  }
  const composition: Composition = {};
  let any = false;
  for (const el of ELEMENTS) {
    const v = obj[el];
    if (v === undefined) continue;
    if (typeof v !== "number" || !Number.isFinite(v) || v < 0 || v > 100) return null;
    composition[el] = v;
    any = true;
  }
  if (!any) return null;
  return { name: typeof obj.name === "string" && obj.name.trim() !== "" ? obj.name.trim() : "custom alloy", composition };
}

/**
 * The alloys of a submitted alloy-explorer state `{ alloys: [...] }` (at most three), or a single flat
 * composition `{ C, Cr, ... }` / `{ grade }` when a client submits one alloy directly.
 */
export function alloysFromSubmission(submitted: Record<string, unknown>): NamedComposition[] {
  const list = submitted.alloys;
  if (Array.isArray(list)) {
    return list
      .slice(0, 3)
      .map(compositionFromSpec)
      .filter((a): a is NamedComposition => a !== null);
  }
  const single = compositionFromSpec(submitted);
  return single ? [single] : [];
}

/** Short formatting for check details. */
export function fmt(value: number, decimals = 2): string {
  return Number.isFinite(value) ? value.toFixed(decimals) : String(value);
}
