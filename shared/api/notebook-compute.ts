/**
 * What the science core says about one notebook entry. The server puts this in every entry
 * response and the form's live preview calls the same function, so the numbers a student sees
 * while typing are the numbers the server returns. Every value comes from shared/metallurgy:
 *
 *   tempering   temperingParameter (Hollomon–Jaffe, C = 20, hours) and temperingConstantForCarbon;
 *               equivalentTemperingHours for "the same temper at another temperature".
 *   hardening   dissolvedFractionsForAustenitizing -> hardenedState (carbon and alloy in solution)
 *               -> martensitePlateauHardnessHrc (as-quenched estimate), andrewsMsWithWarnings (Ms)
 *               -> retainedAusteniteFraction at room temperature and after the cold treatment.
 *
 * Where a model's input range is exceeded the value is null and `unavailable` says why.
 */
import {
  andrewsMsWithWarnings,
  dissolvedFractionsForAustenitizing,
  equivalentTemperingHours,
  hardenedState,
  HOLLOMON_JAFFE_CONSTANT,
  martensitePlateauHardnessHrc,
  retainedAusteniteFraction,
  temperingConstantForCarbon,
  temperingParameter,
  type Composition,
} from "../metallurgy";
import { COLD_TREATMENT_TEMP_C, type ColdTreatment, type HardnessReading } from "./notebook";

/** The quench is taken to end at room temperature [common practice, no source]. */
export const ROOM_TEMP_C = 20;

export interface NotebookComputeInput {
  composition: Composition;
  austenitizeC: number;
  coldTreatment: ColdTreatment;
  temperCycles: number;
  temperC: number | null;
  temperHours: number | null;
  hardness: readonly HardnessReading[];
}

export interface TemperingResult {
  tempC: number;
  cycles: number;
  /** Cycles × hours per cycle: cycles at one temperature are treated as one longer hold [common practice, no source]. */
  totalHours: number;
  /** Hollomon–Jaffe P with C = 20 and time in hours. */
  parameter: number;
  constant: number;
  /** P with the carbon-dependent constant C = 21.3 − 5.8·%C (null outside 0–2.11 % C). */
  carbonConstant: number | null;
  parameterCarbonConstant: number | null;
  warnings: string[];
}

export interface EquivalentResult {
  atC: number;
  hours: number;
  warnings: string[];
}

export interface HardeningResult {
  austenitizeC: number;
  carbonInSolutionMassPct: number | null;
  carbideVolumePct: number | null;
  asQuenchedHrc: number | null;
  msC: number | null;
  retainedAusteniteAtRoom: number | null;
  coldTreatmentC: number | null;
  retainedAusteniteAfterCold: number | null;
  warnings: string[];
  unavailable: string[];
}

export interface ReadingsSummary {
  count: number;
  meanHrc: number | null;
  minHrc: number | null;
  maxHrc: number | null;
}

export interface NotebookComputation {
  tempering: TemperingResult | null;
  equivalent: EquivalentResult | null;
  hardening: HardeningResult;
  readings: ReadingsSummary;
}

const message = (err: unknown) => (err instanceof Error ? err.message : String(err));

export function computeTempering(input: Pick<NotebookComputeInput, "composition" | "temperCycles" | "temperC" | "temperHours">): TemperingResult | null {
  const { temperCycles, temperC, temperHours } = input;
  if (temperCycles <= 0 || temperC === null || temperHours === null) return null;
  const totalHours = temperCycles * temperHours;
  const p = temperingParameter(temperC, totalHours);
  let carbonConstant: number | null = null;
  let parameterCarbonConstant: number | null = null;
  try {
    carbonConstant = temperingConstantForCarbon(input.composition.C ?? 0);
    parameterCarbonConstant = temperingParameter(temperC, totalHours, carbonConstant).value;
  } catch {
    // Carbon outside the steel range of the carbon-dependent constant: only the C = 20 form applies.
  }
  return {
    tempC: temperC,
    cycles: temperCycles,
    totalHours,
    parameter: p.value,
    constant: HOLLOMON_JAFFE_CONSTANT,
    carbonConstant,
    parameterCarbonConstant,
    warnings: p.warnings,
  };
}

/** Default "other temperature" for the equivalent time: 20 °C hotter, or cooler near the top of the range. */
export function defaultEquivalentTempC(temperC: number): number {
  return temperC + 20 <= 700 ? temperC + 20 : temperC - 20;
}

/** Hours at atC that give the same tempering parameter (C = 20); null when the core rejects the inputs. */
export function computeEquivalent(parameter: number, atC: number): EquivalentResult | null {
  try {
    const r = equivalentTemperingHours(parameter, atC);
    return { atC, hours: r.value, warnings: r.warnings };
  } catch {
    return null;
  }
}

export function computeHardening(input: Pick<NotebookComputeInput, "composition" | "austenitizeC" | "coldTreatment">): HardeningResult {
  const coldTreatmentC = COLD_TREATMENT_TEMP_C[input.coldTreatment];
  const out: HardeningResult = {
    austenitizeC: input.austenitizeC,
    carbonInSolutionMassPct: null,
    carbideVolumePct: null,
    asQuenchedHrc: null,
    msC: null,
    retainedAusteniteAtRoom: null,
    coldTreatmentC,
    retainedAusteniteAfterCold: null,
    warnings: [],
    unavailable: [],
  };
  let solution: Composition;
  try {
    const dissolution = dissolvedFractionsForAustenitizing(input.composition, input.austenitizeC);
    const state = hardenedState(input.composition, { dissolvedFraction: dissolution.dissolvedFraction });
    out.carbonInSolutionMassPct = state.solution.carbonMassPct;
    out.carbideVolumePct = state.totalCarbideVolumePct;
    out.warnings.push(...dissolution.warnings, ...state.warnings.filter((w) => !dissolution.warnings.includes(w)));
    solution = state.solution.composition;
  } catch (err) {
    out.unavailable.push(`Carbon in solution: ${message(err)}`);
    return out;
  }
  try {
    const hrc = martensitePlateauHardnessHrc(out.carbonInSolutionMassPct!);
    out.asQuenchedHrc = hrc.value;
    out.warnings.push(...hrc.warnings);
  } catch (err) {
    out.unavailable.push(`As-quenched hardness: ${message(err)}`);
  }
  try {
    const ms = andrewsMsWithWarnings(solution);
    out.msC = ms.value;
    out.warnings.push(...ms.warnings);
    out.retainedAusteniteAtRoom = retainedAusteniteFraction(ms.value, ROOM_TEMP_C);
    if (coldTreatmentC !== null) out.retainedAusteniteAfterCold = retainedAusteniteFraction(ms.value, coldTreatmentC);
  } catch (err) {
    out.unavailable.push(`Ms and retained austenite: ${message(err)}`);
  }
  return out;
}

export function summarizeReadings(hardness: readonly HardnessReading[]): ReadingsSummary {
  if (hardness.length === 0) return { count: 0, meanHrc: null, minHrc: null, maxHrc: null };
  const values = hardness.map((r) => r.hrc);
  return {
    count: values.length,
    meanHrc: values.reduce((s, v) => s + v, 0) / values.length,
    minHrc: Math.min(...values),
    maxHrc: Math.max(...values),
  };
}

/** Everything for one entry; `equivalentAtC` defaults to defaultEquivalentTempC(temperC). */
export function computeNotebookEntry(input: NotebookComputeInput, equivalentAtC?: number): NotebookComputation {
  let tempering: TemperingResult | null = null;
  try {
    tempering = computeTempering(input);
  } catch {
    tempering = null;
  }
  const equivalent = tempering ? computeEquivalent(tempering.parameter, equivalentAtC ?? defaultEquivalentTempC(tempering.tempC)) : null;
  return {
    tempering,
    equivalent,
    hardening: computeHardening(input),
    readings: summarizeReadings(input.hardness),
  };
}
