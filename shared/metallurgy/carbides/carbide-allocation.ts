import { ironMassPct, MOLAR_MASS_G_PER_MOL as M, validateComposition, type Composition, type Element } from "../composition";
import { InfeasibleError, InputError } from "../errors";
import { requireInRange, warnOutside } from "../validate";
import { CARBIDE_DATA, type CarbideType } from "./carbide-data";

/** Elements a CARB-1 carbide can hold (mass per 100 g of alloy). */
export type CarbideElement = "C" | "N" | "V" | "Cr" | "Fe" | "Mo" | "W";
export type ElementMasses = Record<CarbideElement, number>;

export interface CarbidePhase {
  type: CarbideType;
  /** Mass % of the alloy. */
  massPct: number;
  /** Volume % of the alloy (carbides + matrix = 100). */
  volumePct: number;
  /** Cr share y of the metal sites (M7C3, M23C6, M3C). */
  chromiumShare?: number;
  /** Formula units per 100 g of alloy (MC: per V atom, VC_x). */
  formulaMolPer100g: number;
  /** Element masses in this carbide, g per 100 g of alloy. */
  elements: ElementMasses;
}

export interface MatrixState {
  /** Mass % of the alloy. */
  massPct: number;
  volumePct: number;
  /** Contents of the matrix in mass % of the matrix. */
  carbonMassPct: number;
  chromiumMassPct: number;
  molybdenumMassPct: number;
  tungstenMassPct: number;
  vanadiumMassPct: number;
  nitrogenMassPct: number;
  /** Full matrix composition, mass % of the matrix (iron is the balance). */
  composition: Required<Composition>;
}

export interface CarbideAllocation {
  phases: CarbidePhase[];
  matrix: MatrixState;
  totalCarbideMassPct: number;
  totalCarbideVolumePct: number;
  warnings: string[];
}

/** Tunable parameters of CARB-1 (defaults: science-reference §2.2 table). */
export interface AllocationOptions {
  /** x = (C+N)/V in MC; default 0.875 (V8C7) [Mem]. */
  mcInterstitialRatio?: number;
  /** Cr share y7 of M7C3; default 0.5 [App]. */
  m7c3ChromiumShare?: number;
  /** Cr share y23 of M23C6; default 0.7 [App]. */
  m23c6ChromiumShare?: number;
  /** K3, Cr enrichment of cementite over the alloy; default 4 [Mem]. */
  cementiteEnrichment?: number;
  /** Upper bound of the cementite Cr share; default 0.2 [App]. */
  cementiteMaxChromiumShare?: number;
  /** M6C forms when W + 2·Mo ≥ this ("tungsten equivalent"); default 4 [App]. */
  m6cTungstenEquivalentMin?: number;
  /** Cr : C_rem mass ratio below which cementite forms; default 3 [Checked]. */
  cementiteRatioMax?: number;
  /** Cr : C_rem mass ratio from which M23C6 forms; default 16.6 (Cr23C6 stoichiometry) [Computed]. */
  m23c6RatioMin?: number;
  /** Matrix density, g/cm³; default 7.85 [Mem]. */
  matrixDensityGPerCm3?: number;
}

export const ALLOCATION_DEFAULTS: Required<AllocationOptions> = {
  mcInterstitialRatio: 0.875,
  m7c3ChromiumShare: 0.5,
  m23c6ChromiumShare: 0.7,
  cementiteEnrichment: 4,
  cementiteMaxChromiumShare: 0.2,
  m6cTungstenEquivalentMin: 4,
  cementiteRatioMax: 3,
  m23c6RatioMin: 16.6,
  matrixDensityGPerCm3: 7.85,
};

const METAL_SITES: Record<"M7C3" | "M23C6" | "M3C", { m: number; n: number }> = {
  M7C3: { m: 7, n: 3 },
  M23C6: { m: 23, n: 6 },
  M3C: { m: 3, n: 1 },
};

function zeroMasses(): ElementMasses {
  return { C: 0, N: 0, V: 0, Cr: 0, Fe: 0, Mo: 0, W: 0 };
}

function sumMasses(e: ElementMasses): number {
  return e.C + e.N + e.V + e.Cr + e.Fe + e.Mo + e.W;
}

function resolveOptions(opts: AllocationOptions): Required<AllocationOptions> {
  const o = { ...ALLOCATION_DEFAULTS, ...opts };
  requireInRange("mcInterstitialRatio", o.mcInterstitialRatio, { min: 0.5, max: 1 });
  requireInRange("m7c3ChromiumShare", o.m7c3ChromiumShare, { min: 0, minExclusive: true, max: 1 });
  requireInRange("m23c6ChromiumShare", o.m23c6ChromiumShare, { min: 0, minExclusive: true, max: 1 });
  requireInRange("cementiteEnrichment", o.cementiteEnrichment, { min: 0, max: 100 });
  requireInRange("cementiteMaxChromiumShare", o.cementiteMaxChromiumShare, { min: 0, max: 1 });
  requireInRange("m6cTungstenEquivalentMin", o.m6cTungstenEquivalentMin, { min: 0, max: 100 });
  requireInRange("cementiteRatioMax", o.cementiteRatioMax, { min: 0, max: 100 });
  requireInRange("m23c6RatioMin", o.m23c6RatioMin, { min: o.cementiteRatioMax, max: 1000 });
  requireInRange("matrixDensityGPerCm3", o.matrixDensityGPerCm3, { min: 1, max: 30 });
  return o;
}

/** Validates a composition for CARB-1: C ≤ 3.5 (above is cast iron); warns for V > 15, Cr > 30, C > 2.5. */
export function validateCarbideComposition(comp: Composition, warnings: string[]): Required<Composition> {
  const c = validateComposition(comp);
  if (c.C > 3.5) throw new InputError("composition.C", c.C, "≤ 3.5 mass % (above is the cast-iron range)");
  warnOutside(warnings, "V", c.V, 0, 15, "CARB-1");
  warnOutside(warnings, "Cr", c.Cr, 0, 30, "CARB-1");
  warnOutside(warnings, "C", c.C, 0, 2.5, "CARB-1");
  return c;
}

/**
 * Annealed carbide populations from composition, allocation model CARB-1 (science-reference §2.2):
 * (1) N then C to V as MC (VC_x); (2) W and Mo to Fe3M3C when W + 2·Mo ≥ 4; (3) the remaining C to one
 * chromium carbide chosen by the Cr : C_rem mass ratio (< 3 M3C, < 16.6 M7C3, else M23C6) with fixed Cr
 * shares, lowered if the Cr runs out; (4) volumes from pure-carbide molar volumes and a 7.85 g/cm³ matrix.
 * Mass-balance exact; the matrix holds no C (near-equilibrium annealed limit). Masses per 100 g of alloy.
 */
export function allocateCarbides(comp: Composition, opts: AllocationOptions = {}): CarbideAllocation {
  const warnings: string[] = [];
  const c = validateCarbideComposition(comp, warnings);
  const o = resolveOptions(opts);
  const fe = ironMassPct(c);
  const free = { C: c.C, N: c.N, V: c.V, Cr: c.Cr, Fe: fe, Mo: c.Mo, W: c.W };
  const phases: Omit<CarbidePhase, "volumePct">[] = [];

  // 1. MC: n_MC = min(n_V, (n_C + n_N)/x); nitrogen is consumed before carbon.
  const nV = free.V / M.V;
  const nInterstitial = free.C / M.C + free.N / M.N;
  const nMC = Math.min(nV, nInterstitial / o.mcInterstitialRatio);
  if (nMC > 0) {
    const nX = nMC * o.mcInterstitialRatio;
    const nN = Math.min(free.N / M.N, nX);
    const nC = nX - nN;
    const e = zeroMasses();
    e.V = Math.min(free.V, nMC * M.V);
    e.N = Math.min(free.N, nN * M.N);
    e.C = Math.min(free.C, nC * M.C);
    free.V -= e.V; free.N -= e.N; free.C -= e.C;
    phases.push({ type: "MC", massPct: sumMasses(e), formulaMolPer100g: nMC, elements: e });
  }

  // 2. M6C (Fe3M3C) for high-speed-type steels; otherwise Mo and W stay in the matrix.
  if (c.W + 2 * c.Mo >= o.m6cTungstenEquivalentMin && free.C > 0) {
    const nMo = free.Mo / M.Mo;
    const nW = free.W / M.W;
    const nM6C = Math.min((nMo + nW) / 3, free.C / M.C);
    if (nM6C > 0) {
      const moShare = nMo / (nMo + nW); // Mo and W enter in their molar ratio
      const e = zeroMasses();
      e.Mo = Math.min(free.Mo, 3 * nM6C * moShare * M.Mo);
      e.W = Math.min(free.W, 3 * nM6C * (1 - moShare) * M.W);
      e.Fe = 3 * nM6C * M.Fe;
      e.C = Math.min(free.C, nM6C * M.C);
      if (e.Fe > free.Fe + 1e-9) throw ironShortage("M6C", e.Fe, free.Fe);
      free.Mo -= e.Mo; free.W -= e.W; free.Fe -= e.Fe; free.C -= e.C;
      phases.push({ type: "M6C", massPct: sumMasses(e), formulaMolPer100g: nM6C, elements: e });
    }
  }

  // 3. Remaining carbon to one chromium-bearing carbide chosen by the Cr : C ratio.
  if (free.C > 1e-12) {
    const ratio = free.Cr / free.C;
    let type: "M3C" | "M7C3" | "M23C6";
    let y: number;
    if (ratio < o.cementiteRatioMax) {
      type = "M3C";
      const nCrAlloy = c.Cr / M.Cr;
      const xCrAlloy = nCrAlloy / (nCrAlloy + fe / M.Fe);
      y = Math.min(o.cementiteMaxChromiumShare, o.cementiteEnrichment * xCrAlloy);
    } else if (ratio < o.m23c6RatioMin) {
      type = "M7C3";
      y = o.m7c3ChromiumShare;
    } else {
      type = "M23C6";
      y = o.m23c6ChromiumShare;
    }
    const { m, n } = METAL_SITES[type];
    const nUnits = free.C / M.C / n;
    const crNeeded = nUnits * m * y * M.Cr;
    if (crNeeded > free.Cr) {
      // Not enough Cr for the default share: lower y until all Cr is used (science-reference §2.2 step 3).
      const yMax = free.Cr / (nUnits * m * M.Cr);
      warnings.push(`${type}: only ${free.Cr.toFixed(3)} % Cr is left, so its Cr share is lowered from ${y} to ${yMax.toFixed(3)}.`);
      y = yMax;
    }
    const e = zeroMasses();
    e.C = free.C;
    e.Cr = Math.min(free.Cr, nUnits * m * y * M.Cr);
    e.Fe = nUnits * m * (1 - y) * M.Fe;
    if (e.Fe > free.Fe + 1e-9) throw ironShortage(type, e.Fe, free.Fe);
    free.C = 0; free.Cr -= e.Cr; free.Fe -= e.Fe;
    phases.push({ type, massPct: sumMasses(e), chromiumShare: y, formulaMolPer100g: nUnits, elements: e });
  }

  // 4. Volumes and the matrix.
  const carbideMass = phases.reduce((s, p) => s + p.massPct, 0);
  const matrixMass = 100 - carbideMass;
  const matrixVolume = matrixMass / o.matrixDensityGPerCm3;
  const carbideVolumes = phases.map((p) => p.formulaMolPer100g * CARBIDE_DATA[p.type].molarVolumeCm3PerMol);
  const totalVolume = matrixVolume + carbideVolumes.reduce((s, v) => s + v, 0);
  const withVolumes: CarbidePhase[] = phases.map((p, i) => ({ ...p, volumePct: (100 * carbideVolumes[i]) / totalVolume }));
  const matrix = matrixState(c, free, matrixMass, (100 * matrixVolume) / totalVolume);
  return {
    phases: withVolumes,
    matrix,
    totalCarbideMassPct: carbideMass,
    totalCarbideVolumePct: withVolumes.reduce((s, p) => s + p.volumePct, 0),
    warnings,
  };
}

function ironShortage(type: string, needed: number, available: number): InfeasibleError {
  return new InfeasibleError(
    "insufficient-iron",
    `Not enough iron: ${type} needs ${needed.toFixed(2)} % Fe but only ${Math.max(0, available).toFixed(2)} % is left.`,
  );
}

/** Matrix contents in mass % of the matrix, from the element masses left after allocation. */
function matrixState(
  alloy: Required<Composition>,
  free: Record<CarbideElement, number>,
  matrixMass: number,
  volumePct: number,
): MatrixState {
  const composition = {} as Required<Composition>;
  const scale = matrixMass > 0 ? 100 / matrixMass : 0;
  for (const el of Object.keys(alloy) as Element[]) {
    const mass = el in free ? free[el as CarbideElement] : alloy[el];
    composition[el] = Math.max(0, mass) * scale;
  }
  return {
    massPct: matrixMass,
    volumePct,
    carbonMassPct: composition.C,
    chromiumMassPct: composition.Cr,
    molybdenumMassPct: composition.Mo,
    tungstenMassPct: composition.W,
    vanadiumMassPct: composition.V,
    nitrogenMassPct: composition.N,
    composition,
  };
}
