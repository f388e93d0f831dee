/**
 * Parameters of the alloy explorer. The name `alloys` is a contract with the lesson writers
 * (content/AUTHORING.md): up to three of `{ grade }` or `{ name, C, Cr, V, W, Mo, Mn, Si, Ni, N }`.
 * The same shape is what the URL encodes and what a saved alloy stores.
 */
import { z } from "zod";
import type { Composition } from "../../metallurgy/composition";
import { findGrade } from "../../metallurgy/grades";
import { ELEMENT_RANGE_MASS_PCT, type RangedElement } from "./element-ranges";
import { isGradeId } from "./grade-composition";
import { AUSTENITIZING_RANGE_C } from "./austenitizing";

export const ALLOY_ELEMENTS = ["C", "Cr", "V", "W", "Mo", "Mn", "Si", "Ni", "N"] as const satisfies readonly RangedElement[];
export type AlloyElement = (typeof ALLOY_ELEMENTS)[number];

export const MAX_ALLOYS = 3;
export const ALLOY_NAME_MAX = 60;
export const DEFAULT_ALLOYS = [{ grade: "440C" }, { grade: "D2" }] as const;

const pct = (el: AlloyElement) => z.number().min(ELEMENT_RANGE_MASS_PCT[el].min).max(ELEMENT_RANGE_MASS_PCT[el].max).optional();

export const gradeAlloySchema = z.strictObject({
  grade: z.string().refine(isGradeId, { message: "Unknown grade preset id." }),
});

export const customAlloySchema = z.strictObject({
  name: z.string().trim().min(1).max(ALLOY_NAME_MAX),
  C: pct("C"),
  Cr: pct("Cr"),
  V: pct("V"),
  W: pct("W"),
  Mo: pct("Mo"),
  Mn: pct("Mn"),
  Si: pct("Si"),
  Ni: pct("Ni"),
  N: pct("N"),
});

export const alloySpecSchema = z.union([gradeAlloySchema, customAlloySchema]);
export type AlloySpec = z.infer<typeof alloySpecSchema>;
export type CustomAlloySpec = z.infer<typeof customAlloySchema>;

export const COLD_TREATMENT_RANGE_C = { min: -196, max: 0 } as const;

export const paramsSchema = z.strictObject({
  alloys: z
    .array(alloySpecSchema)
    .min(1)
    .max(MAX_ALLOYS)
    .default(() => DEFAULT_ALLOYS.map((a) => ({ ...a }))),
  /** Temperature of the sub-zero treatment after the quench, °C (dry ice about −78, liquid nitrogen −196). */
  coldTreatmentC: z.number().min(COLD_TREATMENT_RANGE_C.min).max(COLD_TREATMENT_RANGE_C.max).default(-80),
  /** One hardening temperature for every alloy, °C; absent = the typical temperature of each alloy's family. */
  austenitizingTempC: z.number().min(AUSTENITIZING_RANGE_C.min).max(AUSTENITIZING_RANGE_C.max).optional(),
});

export type AlloyParamsInput = z.input<typeof paramsSchema>;
export type AlloyParams = z.output<typeof paramsSchema>;

/** An alloy ready for computation: a label, the preset it came from and its composition. */
export interface ResolvedAlloy {
  name: string;
  gradeId: string | null;
  composition: Composition;
}

export function isGradeSpec(spec: AlloySpec): spec is { grade: string } {
  return "grade" in spec;
}

export function resolveAlloy(spec: AlloySpec): ResolvedAlloy {
  if (isGradeSpec(spec)) {
    const grade = findGrade(spec.grade);
    return { name: grade?.label ?? spec.grade, gradeId: spec.grade, composition: { ...(grade?.composition ?? {}) } };
  }
  const composition: Composition = {};
  for (const el of ALLOY_ELEMENTS) {
    const v = spec[el];
    if (typeof v === "number" && v > 0) composition[el] = v;
  }
  return { name: spec.name, gradeId: null, composition };
}

/** A grade preset turned into an editable custom alloy (the first slider move does this). */
export function toCustomSpec(spec: AlloySpec): CustomAlloySpec {
  const resolved = resolveAlloy(spec);
  const out: CustomAlloySpec = { name: isGradeSpec(spec) ? `${resolved.name} (modified)` : spec.name };
  for (const el of ALLOY_ELEMENTS) {
    const v = resolved.composition[el];
    if (v !== undefined && v > 0) out[el] = v;
  }
  return out;
}
