/**
 * Parameters of the ingot-freezing simulation. The names are a contract with the lesson
 * writers (content/AUTHORING.md): `grade` or `C`, `Cr`, `V`, `Mo`, `Mn`, `Si`; `sizeMm`;
 * `mould`; `mixing`; `element`. Unknown keys are rejected so a typo in a lesson preset fails
 * the content check instead of being ignored.
 */
import { z } from "zod";
import type { Composition } from "../../metallurgy/composition";
import { ELEMENT_RANGE_MASS_PCT } from "../alloy/element-ranges";
import { isGradeId, resolveComposition } from "../alloy/grade-composition";

import { INGOT_ELEMENTS, MOULDS, type IngotElement, type Mould } from "./constants";

export { INGOT_ELEMENTS, MOULDS, type IngotElement, type Mould };

export const SIZE_RANGE_MM = { min: 50, max: 1500 } as const;

export const DEFAULT_INGOT_GRADE = "D2";

export const INGOT_SIM_DEFAULTS = {
  sizeMm: 300,
  mould: "sand" as Mould,
  mixing: 0.5,
  element: "V" as IngotElement,
};

const pct = (el: IngotElement) => z.number().min(ELEMENT_RANGE_MASS_PCT[el].min).max(ELEMENT_RANGE_MASS_PCT[el].max).optional();

export const paramsSchema = z.strictObject({
  grade: z.string().refine(isGradeId, { message: "Unknown grade preset id." }).optional(),
  C: pct("C"),
  Cr: pct("Cr"),
  V: pct("V"),
  Mo: pct("Mo"),
  Mn: pct("Mn"),
  Si: pct("Si"),
  /** Ingot diameter (round ingot), mm. */
  sizeMm: z.number().min(SIZE_RANGE_MM.min).max(SIZE_RANGE_MM.max).default(INGOT_SIM_DEFAULTS.sizeMm),
  mould: z.enum(MOULDS).default(INGOT_SIM_DEFAULTS.mould),
  /** 0 = stagnant liquid ahead of the front, 1 = fully mixed liquid. */
  mixing: z.number().min(0).max(1).default(INGOT_SIM_DEFAULTS.mixing),
  /** The element whose solute map and segregation profile are drawn; absent = defaultMapElement. */
  element: z.enum(INGOT_ELEMENTS).optional(),
});

export type IngotSimParamsInput = z.input<typeof paramsSchema>;
export type IngotSimParams = z.output<typeof paramsSchema>;

/** What the solver and the view use: a definite composition plus the settings. */
export interface ResolvedIngotSimParams {
  composition: Composition;
  /** The preset the composition came from, or null when it was typed or modified. */
  gradeId: string | null;
  sizeMm: number;
  mould: Mould;
  mixing: number;
  element: IngotElement;
}

/** Vanadium's map when the steel carries enough to matter, else carbon's (a plain steel's V map is empty). */
export function defaultMapElement(composition: Composition): IngotElement {
  return (composition.V ?? 0) >= 0.1 ? INGOT_SIM_DEFAULTS.element : "C";
}

export function resolveIngotSimParams(params: IngotSimParams): ResolvedIngotSimParams {
  const { composition, gradeId } = resolveComposition(params, INGOT_ELEMENTS, DEFAULT_INGOT_GRADE);
  const element = params.element ?? defaultMapElement(composition);
  return { composition, gradeId, sizeMm: params.sizeMm, mould: params.mould, mixing: params.mixing, element };
}

/** Parse untrusted input (a lesson preset, URL parameters); throws a ZodError when invalid. */
export function parseIngotSimParams(input: unknown): ResolvedIngotSimParams {
  return resolveIngotSimParams(paramsSchema.parse(input ?? {}));
}

/** Back to the contract's names (for a quiz task reading the learner's settings, or a URL). */
export function toIngotParams(sim: ResolvedIngotSimParams): IngotSimParamsInput {
  const base = { sizeMm: sim.sizeMm, mould: sim.mould, mixing: sim.mixing, element: sim.element };
  if (sim.gradeId) return { grade: sim.gradeId, ...base };
  const composition = Object.fromEntries(INGOT_ELEMENTS.map((el) => [el, sim.composition[el] ?? 0]));
  return { ...composition, ...base };
}
