import { validateComposition, type Composition, type Element } from "../composition";
import { InputError } from "../errors";
import { requireInRange } from "../validate";
import { allocateCarbides, type AllocationOptions, type CarbideAllocation, type CarbidePhase, type CarbideElement, type MatrixState } from "./carbide-allocation";
import { CARBIDE_DATA, CARBIDE_TYPES, type CarbideType } from "./carbide-data";

export interface HardenedStateOptions {
  /** Fraction (0–1) of each annealed carbide that dissolves into austenite; a missing type keeps 0. */
  dissolvedFraction: Partial<Record<CarbideType, number>>;
  /** Parameters of the underlying CARB-1 allocation. */
  allocation?: AllocationOptions;
}

/**
 * The austenite (→ martensite) at the hardening temperature, in the same shape as the annealed
 * matrix: its contents in solution (mass % of the austenite) feed §2.3–2.4 (hardness, Ms).
 */
export type SolutionState = MatrixState;

export interface HardenedState {
  solution: SolutionState;
  /** Carbides left undissolved (mass and volume % of the alloy). */
  phases: CarbidePhase[];
  totalCarbideVolumePct: number;
  /** The annealed allocation the dissolution started from. */
  annealed: CarbideAllocation;
  warnings: string[];
}

/**
 * Hardened (austenitized) state, CARB-1 step 5 (science-reference §2.2): a fraction f_d of each annealed
 * carbide dissolves; C_sol = (matrix C + Σ f_d·C_in_carbide) / (matrix mass + Σ f_d·carbide mass), and the
 * same for Cr, Mo, W, V, N. The remaining carbides keep their composition. Defaults: nothing dissolves
 * unless a fraction is given (MC and M6C stay, the reference's defaults; Cr carbides and M3C are user-set).
 */
export function hardenedState(comp: Composition, opts: HardenedStateOptions): HardenedState {
  const c = validateComposition(comp);
  if (!opts || typeof opts.dissolvedFraction !== "object" || opts.dissolvedFraction === null) {
    throw new InputError("dissolvedFraction", opts?.dissolvedFraction, "an object of fractions 0–1 per carbide type");
  }
  for (const key of Object.keys(opts.dissolvedFraction)) {
    if (!(CARBIDE_TYPES as readonly string[]).includes(key)) throw new InputError(`dissolvedFraction.${key}`, key, `one of ${CARBIDE_TYPES.join(", ")}`);
    requireInRange(`dissolvedFraction.${key}`, opts.dissolvedFraction[key as CarbideType] as number, { min: 0, max: 1 });
  }
  const annealed = allocateCarbides(c, opts.allocation);
  const warnings = [...annealed.warnings];
  const density = opts.allocation?.matrixDensityGPerCm3 ?? 7.85;

  // Element masses in solution (g per 100 g of alloy): the matrix plus what dissolves.
  const solutionMass = {} as Record<Element, number>;
  for (const el of Object.keys(c) as Element[]) solutionMass[el] = (annealed.matrix.composition[el] * annealed.matrix.massPct) / 100;
  let austeniteMass = annealed.matrix.massPct;
  const remaining: Omit<CarbidePhase, "volumePct">[] = [];
  for (const p of annealed.phases) {
    const f = opts.dissolvedFraction[p.type] ?? 0;
    if (f > 0) {
      // Fe is the balance of a composition, so only the listed elements are tracked.
      for (const el of Object.keys(p.elements) as CarbideElement[]) if (el !== "Fe") solutionMass[el] += f * p.elements[el];
      austeniteMass += f * p.massPct;
    }
    if (f < 1) {
      const elements = { ...p.elements };
      for (const el of Object.keys(elements) as CarbideElement[]) elements[el] *= 1 - f;
      remaining.push({ ...p, massPct: (1 - f) * p.massPct, formulaMolPer100g: (1 - f) * p.formulaMolPer100g, elements });
    }
  }
  const composition = {} as Required<Composition>;
  for (const el of Object.keys(c) as Element[]) composition[el] = austeniteMass > 0 ? Math.max(0, (100 * solutionMass[el]) / austeniteMass) : 0;

  const volumes = remaining.map((p) => p.formulaMolPer100g * CARBIDE_DATA[p.type].molarVolumeCm3PerMol);
  const austeniteVolume = austeniteMass / density;
  const totalVolume = austeniteVolume + volumes.reduce((s, v) => s + v, 0);
  const phases = remaining.map((p, i) => ({ ...p, volumePct: (100 * volumes[i]) / totalVolume }));
  if (composition.C > 2.11) warnings.push(`C in solution ${composition.C.toFixed(2)} % exceeds the 2.11 % maximum solubility in austenite.`);
  return {
    solution: {
      massPct: austeniteMass,
      volumePct: (100 * austeniteVolume) / totalVolume,
      carbonMassPct: composition.C,
      chromiumMassPct: composition.Cr,
      molybdenumMassPct: composition.Mo,
      tungstenMassPct: composition.W,
      vanadiumMassPct: composition.V,
      nitrogenMassPct: composition.N,
      composition,
    },
    phases,
    totalCarbideVolumePct: phases.reduce((s, p) => s + p.volumePct, 0),
    annealed,
    warnings,
  };
}
