import {
  allocateCarbides,
  dissolvedFractionsForAustenitizing,
  hardenedState,
  hrcToHv,
  martensiteHardnessHrc,
  type CarbideType,
  type Composition,
} from "../../metallurgy";
import { ANNEALED_MATRIX_HV, MARTENSITE_CARBON_CAP_MASS_PCT } from "./constants";

export interface PhaseAmount {
  type: CarbideType;
  /** Volume % of the steel. */
  volumePct: number;
  /** Fraction of the annealed amount that dissolved on austenitizing (0 when annealed). */
  dissolvedFraction: number;
}

export interface CarbidePopulationState {
  state: "annealed" | "hardened";
  austenitizingTempC: number;
  /** Carbides present (hardened: those left undissolved). */
  phases: PhaseAmount[];
  /** The annealed population (what the field is sampled from). */
  annealed: { type: CarbideType; volumePct: number }[];
  totalCarbideVolumePct: number;
  /** Carbon in solution in the martensite (hardened) or 0 (annealed, ferrite holds ≈ 0 C). */
  carbonInSolutionMassPct: number;
  chromiumInSolutionMassPct: number;
  matrixHv: number;
  /** Martensite hardness in HRC (hardened only). */
  matrixHrc: number | null;
  warnings: string[];
}

/**
 * The carbide population and matrix of a steel, from the core: CARB-1 allocation (annealed), dissolution on
 * austenitizing and the hardened state, and the matrix hardness (ASTM A255 polynomial → HV via E140 table).
 */
export function carbidePopulation(composition: Composition, state: "annealed" | "hardened", austenitizingTempC: number): CarbidePopulationState {
  const annealed = allocateCarbides(composition);
  const annealedPhases = annealed.phases.map((p) => ({ type: p.type, volumePct: p.volumePct }));
  if (state === "annealed") {
    return {
      state,
      austenitizingTempC,
      phases: annealed.phases.map((p) => ({ type: p.type, volumePct: p.volumePct, dissolvedFraction: 0 })),
      annealed: annealedPhases,
      totalCarbideVolumePct: annealed.totalCarbideVolumePct,
      carbonInSolutionMassPct: annealed.matrix.carbonMassPct,
      chromiumInSolutionMassPct: annealed.matrix.chromiumMassPct,
      matrixHv: ANNEALED_MATRIX_HV,
      matrixHrc: null,
      warnings: annealed.warnings,
    };
  }
  const dissolution = dissolvedFractionsForAustenitizing(composition, austenitizingTempC);
  const hardened = hardenedState(composition, { dissolvedFraction: dissolution.dissolvedFraction });
  const carbon = hardened.solution.carbonMassPct;
  const warnings = [...new Set([...dissolution.warnings, ...hardened.warnings])];
  if (carbon > MARTENSITE_CARBON_CAP_MASS_PCT) {
    warnings.push(
      `${carbon.toFixed(2)} % C is in solution; martensite hardness is taken at ${MARTENSITE_CARBON_CAP_MASS_PCT} % C, where it levels off as retained austenite grows.`,
    );
  }
  const hrc = martensiteHardnessHrc(Math.min(carbon, MARTENSITE_CARBON_CAP_MASS_PCT));
  const byType = new Map(hardened.phases.map((p) => [p.type, p.volumePct]));
  return {
    state,
    austenitizingTempC,
    phases: annealed.phases.map((p) => ({
      type: p.type,
      volumePct: byType.get(p.type) ?? 0,
      dissolvedFraction: dissolution.dissolvedFraction[p.type],
    })),
    annealed: annealedPhases,
    totalCarbideVolumePct: hardened.totalCarbideVolumePct,
    carbonInSolutionMassPct: carbon,
    chromiumInSolutionMassPct: hardened.solution.chromiumMassPct,
    matrixHv: hrcToHv(Math.max(20, Math.min(68, hrc))),
    matrixHrc: hrc,
    warnings,
  };
}
