import { z } from "zod";
import { GRADE_PRESETS } from "../../metallurgy";

const GRADE_IDS = GRADE_PRESETS.map((g) => g.id) as [string, ...string[]];

/**
 * Parameters of the carbide simulation. Names are a contract with the lesson writers (content/AUTHORING.md):
 * `grade` (a preset id of shared/metallurgy/grades.ts) and/or `C`, `Cr`, `V`, `W`, `Mo` in mass % (an element
 * given explicitly overrides the grade's value); `state`, `austenitizingTempC`, `coarseningHours`, `view`,
 * `abrasive`. Extensions beyond AUTHORING.md: `seed`, `sizeModel` and `fieldUm`. Unknown keys are rejected.
 */
export const carbideParamsSchema = z
  .object({
    grade: z.enum(GRADE_IDS).optional(),
    C: z.number().min(0).max(3.5).optional(),
    Cr: z.number().min(0).max(30).optional(),
    V: z.number().min(0).max(15).optional(),
    W: z.number().min(0).max(20).optional(),
    Mo: z.number().min(0).max(12).optional(),
    state: z.enum(["annealed", "hardened"]).default("hardened"),
    /** Austenitizing (and coarsening hold) temperature; default: the grade's usual hardening temperature. */
    austenitizingTempC: z.number().min(760).max(1200).optional(),
    /** Time held at the austenitizing temperature, during which carbides coarsen (LSW). */
    coarseningHours: z.number().min(0).max(100).default(0),
    view: z.enum(["field", "edge", "sharpen", "chart"]).default("field"),
    /** The sharpening stone's abrasive. */
    abrasive: z.enum(["alumina", "silicon-carbide", "diamond"]).default("alumina"),
    seed: z.number().int().min(0).max(2 ** 31 - 1).default(1),
    sizeModel: z.enum(["lognormal", "lsw"]).default("lognormal"),
    /** Edge length of the drawn field, µm. */
    fieldUm: z.number().min(20).max(200).default(60),
  })
  .strict();

export type CarbideParams = z.output<typeof carbideParamsSchema>;
export type CarbideParamsInput = z.input<typeof carbideParamsSchema>;

export const CARBIDE_PARAM_KEYS = Object.keys(carbideParamsSchema.shape) as (keyof CarbideParams)[];

/** Validates a (partial) preset and fills defaults; with neither grade nor elements given, the grade is 440C. */
export function parseCarbideParams(input: unknown): CarbideParams {
  const p = carbideParamsSchema.parse(input ?? {});
  const hasElements = p.C !== undefined || p.Cr !== undefined || p.V !== undefined || p.W !== undefined || p.Mo !== undefined;
  return p.grade === undefined && !hasElements ? { ...p, grade: "440C" } : p;
}
