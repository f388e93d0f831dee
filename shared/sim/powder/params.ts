/**
 * Parameters of the gas-atomised powder simulation. Names are a contract with the lesson
 * writers (content/AUTHORING.md): `grade`; `medianDiameterUm`; `geometricStdDev`; `gas`;
 * `gasVelocityMPerS`; `superheatC`; `undercoolingK`. The HIP controls are extra, optional
 * names of this simulation. Unknown keys are rejected.
 */
import { z } from "zod";
import type { Composition } from "../../metallurgy/composition";
import { findGrade } from "../../metallurgy/grades";
import { isGradeId } from "../alloy/grade-composition";

export const GASES = ["N2", "Ar"] as const;
export type AtomisingGas = (typeof GASES)[number];

export const DEFAULT_POWDER_GRADE = "A11";

export const POWDER_RANGES = {
  medianDiameterUm: { min: 10, max: 300, step: 1 },
  geometricStdDev: { min: 1.2, max: 3, step: 0.05 },
  gasVelocityMPerS: { min: 0, max: 300, step: 5 },
  superheatC: { min: 0, max: 300, step: 5 },
  undercoolingK: { min: 0, max: 300, step: 5 },
  hipPressureMPa: { min: 20, max: 300, step: 5 },
  hipTempC: { min: 900, max: 1250, step: 10 },
} as const;

// Defaults: D50 80 µm and σg 2.0 as in science-reference §4.1 [App]; ΔTn 50 K as in §4.2 [App];
// 100–150 MPa, 1100–1150 °C typical HIP of tool-steel powder (§4.3, common practice).
export const POWDER_DEFAULTS = {
  medianDiameterUm: 80,
  geometricStdDev: 2.0,
  gas: "N2" as AtomisingGas,
  gasVelocityMPerS: 100,
  superheatC: 150,
  undercoolingK: 50,
  hipPressureMPa: 100,
  hipTempC: 1150,
};

const ranged = (key: keyof typeof POWDER_RANGES, fallback: number) =>
  z.number().min(POWDER_RANGES[key].min).max(POWDER_RANGES[key].max).default(fallback);

export const paramsSchema = z.strictObject({
  grade: z.string().refine(isGradeId, { message: "Unknown grade preset id." }).default(DEFAULT_POWDER_GRADE),
  medianDiameterUm: ranged("medianDiameterUm", POWDER_DEFAULTS.medianDiameterUm),
  geometricStdDev: ranged("geometricStdDev", POWDER_DEFAULTS.geometricStdDev),
  gas: z.enum(GASES).default(POWDER_DEFAULTS.gas),
  gasVelocityMPerS: ranged("gasVelocityMPerS", POWDER_DEFAULTS.gasVelocityMPerS),
  superheatC: ranged("superheatC", POWDER_DEFAULTS.superheatC),
  undercoolingK: ranged("undercoolingK", POWDER_DEFAULTS.undercoolingK),
  hipPressureMPa: ranged("hipPressureMPa", POWDER_DEFAULTS.hipPressureMPa),
  hipTempC: ranged("hipTempC", POWDER_DEFAULTS.hipTempC),
});

export type PowderParamsInput = z.input<typeof paramsSchema>;
export type PowderParams = z.output<typeof paramsSchema>;

export interface ResolvedPowderParams extends PowderParams {
  composition: Composition;
}

export function resolvePowderParams(params: PowderParams): ResolvedPowderParams {
  return { ...params, composition: { ...(findGrade(params.grade)?.composition ?? {}) } };
}

export function parsePowderParams(input: unknown): ResolvedPowderParams {
  return resolvePowderParams(paramsSchema.parse(input ?? {}));
}
