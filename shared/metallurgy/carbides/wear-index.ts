import { InputError } from "../errors";
import { requireInRange, requirePositive } from "../validate";
import { ABRASIVES, CARBIDE_DATA, type AbrasiveKey, type CarbideType } from "./carbide-data";

/** One phase of the wearing surface: volume fraction (0–1) and Vickers hardness (HV). */
export interface WearPhase {
  volumeFraction: number;
  hardnessHv: number;
  /** Optional name for charts ("martensite", "MC", …). */
  label?: string;
}

export interface WearIndexOptions {
  /** H0, hardness that scores 1 as a single phase; default 700 HV [App]. */
  referenceHardnessHv?: number;
  /** G, gain of a phase the abrasive cannot scratch; default 10 [App]. */
  unscratchedGain?: number;
  /** Lower end of the transition band of H_abrasive/H_phase; default 0.8 [App]. */
  bandLow?: number;
  /** Upper end: the abrasive scratches a phase from this hardness ratio up; default 1.2 [Checked] J. Tribol. 132 (2010) 034502. */
  bandHigh?: number;
}

export const WEAR_INDEX_DEFAULTS: Required<WearIndexOptions> = {
  referenceHardnessHv: 700,
  unscratchedGain: 10,
  bandLow: 0.8,
  bandHigh: 1.2,
};

function resolve(opts: WearIndexOptions): Required<WearIndexOptions> {
  const o = { ...WEAR_INDEX_DEFAULTS, ...opts };
  requirePositive("referenceHardnessHv", o.referenceHardnessHv);
  requireInRange("unscratchedGain", o.unscratchedGain, { min: 1, max: 1000 });
  requirePositive("bandLow", o.bandLow);
  requireInRange("bandHigh", o.bandHigh, { min: o.bandLow, minExclusive: true, max: 100 });
  return o;
}

/**
 * Resistance gain g of a phase against an abrasive, from the hardness ratio ρ = H_abrasive/H_phase:
 * g = 1 for ρ ≥ 1.2 (scratched), G for ρ ≤ 0.8 (not scratched), exp(ln G·(1.2 − ρ)/0.4) between.
 * Science-reference §2.6 ([App] model; 1.2 [Checked]).
 */
export function abrasionGain(hardnessRatio: number, opts: WearIndexOptions = {}): number {
  requirePositive("hardnessRatio", hardnessRatio);
  const { unscratchedGain: g, bandLow, bandHigh } = resolve(opts);
  if (hardnessRatio >= bandHigh) return 1;
  if (hardnessRatio <= bandLow) return g;
  return Math.exp((Math.log(g) * (bandHigh - hardnessRatio)) / (bandHigh - bandLow));
}

function validatePhases(phases: readonly WearPhase[]): void {
  if (!Array.isArray(phases) || phases.length === 0) throw new InputError("phases", phases, "a non-empty list of { volumeFraction, hardnessHv }");
  let sum = 0;
  phases.forEach((p, i) => {
    requireInRange(`phases[${i}].volumeFraction`, p?.volumeFraction, { min: 0, max: 1 });
    requirePositive(`phases[${i}].hardnessHv`, p.hardnessHv);
    sum += p.volumeFraction;
  });
  if (Math.abs(sum - 1) > 1e-6) throw new InputError("phases (sum of volumeFraction)", sum, "1 ± 1e-6");
}

/**
 * Relative abrasive-wear resistance ε(H_a) = Σ f_i·(H_i/H0)·g(H_a/H_i) of a multiphase surface against an
 * abrasive of hardness H_a (HV). Linear rule of mixtures (Khruschov 1974) [Checked citation] with the
 * scratch threshold H_a/H ≈ 1.2 [Checked]; H0 and G are [App]. Science-reference §2.6. A relative number,
 * 1 for a single 700 HV phase that is scratched; says nothing about toughness.
 */
export function wearIndex(phases: readonly WearPhase[], abrasiveHardnessHv: number, opts: WearIndexOptions = {}): number {
  validatePhases(phases);
  requirePositive("abrasiveHardnessHv", abrasiveHardnessHv);
  const o = resolve(opts);
  let sum = 0;
  for (const p of phases) {
    sum += p.volumeFraction * (p.hardnessHv / o.referenceHardnessHv) * abrasionGain(abrasiveHardnessHv / p.hardnessHv, o);
  }
  return sum;
}

function abrasiveHv(parameter: string, abrasive: AbrasiveKey | number): number {
  if (typeof abrasive === "number") return requirePositive(parameter, abrasive);
  const a = ABRASIVES[abrasive as AbrasiveKey];
  if (!a) throw new InputError(parameter, abrasive, `one of ${Object.keys(ABRASIVES).join(", ")} or a hardness in HV`);
  return a.typicalHv;
}

/**
 * Edge-retention index ERI = ε(H_abrasive)/ε_ref (ε_ref = 1): wear resistance against the abrasive met in
 * cutting, default quartz 1100 HV (silica-loaded test media [Mem]). Science-reference §2.6. Relative only.
 */
export function edgeRetentionIndex(
  phases: readonly WearPhase[],
  opts: WearIndexOptions & { abrasive?: AbrasiveKey | number } = {},
): number {
  return wearIndex(phases, abrasiveHv("abrasive", opts.abrasive ?? "quartz"), opts);
}

/**
 * Sharpening-effort index SEI = ε(H_stone)/ε_ref: the same sum against the sharpening stone's abrasive
 * (default aluminium oxide 2000 HV; also silicon-carbide, cbn, diamond or an HV value). Explains why
 * vanadium-carbide-rich steels are slow on aluminium-oxide stones but not on diamond. Science-reference §2.6.
 */
export function sharpeningEffortIndex(
  phases: readonly WearPhase[],
  stone: AbrasiveKey | number = "aluminium-oxide",
  opts: WearIndexOptions = {},
): number {
  return wearIndex(phases, abrasiveHv("stone", stone), opts);
}

/** Anything with carbide phases in volume % (an annealed allocation or a hardened state). */
export interface CarbidePopulation {
  phases: readonly { type: CarbideType; volumePct: number }[];
}

/**
 * Turns a carbide population (allocateCarbides or hardenedState result) and a matrix hardness (HV) into
 * wear phases: each carbide with its typical hardness from CARBIDE_DATA (override per type), the matrix
 * taking the rest of the volume so the fractions sum to exactly 1.
 */
export function wearPhasesFromCarbides(
  population: CarbidePopulation,
  matrixHardnessHv: number,
  opts: { carbideHardnessHv?: Partial<Record<CarbideType, number>> } = {},
): WearPhase[] {
  requirePositive("matrixHardnessHv", matrixHardnessHv);
  const list: readonly { type: CarbideType; volumePct: number }[] | undefined = population?.phases;
  if (!Array.isArray(list)) throw new InputError("population.phases", population, "a list of { type, volumePct }");
  const phases: WearPhase[] = list.map((p: { type: CarbideType; volumePct: number }, i: number) => {
    const hv = opts.carbideHardnessHv?.[p.type] ?? CARBIDE_DATA[p.type]?.typicalHv;
    if (hv === undefined) throw new InputError(`population.phases[${i}].type`, p.type, "a carbide type of CARBIDE_DATA");
    requireInRange(`population.phases[${i}].volumePct`, p.volumePct, { min: 0, max: 100 });
    return { label: p.type, volumeFraction: p.volumePct / 100, hardnessHv: requirePositive(`carbideHardnessHv.${p.type}`, hv) };
  });
  const carbide = phases.reduce((s, p) => s + p.volumeFraction, 0);
  if (carbide > 1 + 1e-9) throw new InputError("population (carbide volume)", carbide * 100, "at most 100 volume %");
  return [{ label: "matrix", volumeFraction: Math.max(0, 1 - carbide), hardnessHv: matrixHardnessHv }, ...phases];
}
