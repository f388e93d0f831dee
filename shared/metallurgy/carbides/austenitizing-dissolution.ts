import { validateComposition, type Composition } from "../composition";
import { InputError } from "../errors";
import { requireInRange } from "../validate";
import { allocateCarbides, type AllocationOptions } from "./carbide-allocation";
import type { CarbideType } from "./carbide-data";

import { austeniteCarbonOnAcmMassPct } from "../heat-treatment/critical-temperatures";

/** Eutectoid temperature and carbon of the ASM Fe–C diagram (science-reference §5.2). */
const EUTECTOID_TEMP_C = 727;
const EUTECTOID_C = 0.77;
/** The Acm line ends at the eutectic (1148 °C); above it austenite holds its maximum carbon. */
const ACM_TOP_C = 1148;

/** Carbon in austenite on the Acm line, clamped to the line's temperature span. */
function acmAusteniteCarbonMassPct(tempC: number): number {
  return austeniteCarbonOnAcmMassPct(Math.min(Math.max(tempC, EUTECTOID_TEMP_C), ACM_TOP_C));
}

/** A linear dissolution window: nothing below startC, maxFraction from endC upward. [App] */
export interface DissolutionWindow {
  startC: number;
  endC: number;
  maxFraction: number;
}

/**
 * [App] heuristic dissolution windows for alloy carbides (no source; a model the UI should label and let the
 * user tune). Picked so that about half the M7C3 of a 440C-type steel dissolves at 1050 °C (the amount the
 * reference's hardening check 8 uses), M23C6 of 420-type steels is gone by 1100 °C, and MC (VC) and M6C stay
 * largely undissolved at high-speed-steel hardening temperatures (≈ 15 % of MC and 40 % of M6C at 1200 °C).
 */
export const DEFAULT_DISSOLUTION_WINDOWS: Readonly<Record<Exclude<CarbideType, "M3C">, DissolutionWindow>> = {
  M23C6: { startC: 850, endC: 1100, maxFraction: 1 },
  M7C3: { startC: 900, endC: 1200, maxFraction: 1 },
  M6C: { startC: 1000, endC: 1300, maxFraction: 0.6 },
  MC: { startC: 1100, endC: 1300, maxFraction: 0.3 },
};

export interface DissolutionOptions {
  windows?: Partial<Record<Exclude<CarbideType, "M3C">, DissolutionWindow>>;
  allocation?: AllocationOptions;
}

export interface DissolutionResult {
  /** Fraction of each annealed carbide dissolved at the austenitizing temperature (feed to hardenedState). */
  dissolvedFraction: Record<CarbideType, number>;
  /** How each fraction was obtained. */
  method: Partial<Record<CarbideType, "acm-lever-rule" | "app-heuristic">>;
  /** Carbon of austenite on the Acm line (M3C steels above 727 °C), mass %. */
  acmCarbonMassPct?: number;
  warnings: string[];
}

function windowFraction(w: DissolutionWindow, tempC: number): number {
  if (tempC <= w.startC) return 0;
  if (tempC >= w.endC) return w.maxFraction;
  return (w.maxFraction * (tempC - w.startC)) / (w.endC - w.startC);
}

/**
 * Dissolved fraction of each CARB-1 carbide after austenitizing at `austenitizingTempC` (°C, 0–1400).
 * Cementite (M3C): from the Acm lever rule (science-reference §5.2, [Computed] straight Acm line) — the
 * fraction that leaves austenite at C_γ(T) with the remaining cementite, exact for binary Fe–C (other
 * alloying shifts Acm; a warning says so). Alloy carbides (MC, M6C, M7C3, M23C6): [App] linear windows,
 * see DEFAULT_DISSOLUTION_WINDOWS. Below 727 °C nothing dissolves (no austenite).
 */
export function dissolvedFractionsForAustenitizing(
  comp: Composition,
  austenitizingTempC: number,
  opts: DissolutionOptions = {},
): DissolutionResult {
  const c = validateComposition(comp);
  const tempC = requireInRange("austenitizingTempC", austenitizingTempC, { min: 0, max: 1400 });
  const windows = { ...DEFAULT_DISSOLUTION_WINDOWS, ...opts.windows };
  for (const [type, w] of Object.entries(windows)) {
    requireInRange(`windows.${type}.startC`, w.startC, { min: 0, max: 1600 });
    requireInRange(`windows.${type}.endC`, w.endC, { min: w.startC, minExclusive: true, max: 1600 });
    requireInRange(`windows.${type}.maxFraction`, w.maxFraction, { min: 0, max: 1 });
  }
  const allocation = allocateCarbides(c, opts.allocation);
  const warnings = [...allocation.warnings];
  const dissolvedFraction: Record<CarbideType, number> = { MC: 0, M6C: 0, M7C3: 0, M23C6: 0, M3C: 0 };
  const method: DissolutionResult["method"] = {};
  if (tempC > 1300) warnings.push(`${tempC} °C is above typical austenitizing temperatures; incipient melting is likely in high-alloy steels.`);
  if (tempC <= EUTECTOID_TEMP_C) {
    warnings.push(`${tempC} °C is at or below the eutectoid (727 °C): no austenite forms, nothing dissolves.`);
    return { dissolvedFraction, method, warnings };
  }

  for (const p of allocation.phases) {
    if (p.type === "M3C") continue;
    dissolvedFraction[p.type] = windowFraction(windows[p.type], tempC);
    method[p.type] = "app-heuristic";
  }

  let acmCarbon: number | undefined;
  const cementite = allocation.phases.find((p) => p.type === "M3C");
  if (cementite) {
    acmCarbon = acmAusteniteCarbonMassPct(tempC);
    // Solve C_sol(f) = C_γ for the cementite fraction f, the other carbides dissolving as set above:
    // C_γ·(M0 + Σ f_i m_i + f·m3) = 100·(C0 + Σ f_i C_i + f·C3).
    let mass = allocation.matrix.massPct;
    let carbon = (allocation.matrix.carbonMassPct * allocation.matrix.massPct) / 100;
    for (const p of allocation.phases) {
      if (p.type === "M3C") continue;
      mass += dissolvedFraction[p.type] * p.massPct;
      carbon += dissolvedFraction[p.type] * p.elements.C;
    }
    const denominator = 100 * cementite.elements.C - acmCarbon * cementite.massPct;
    if (!(denominator > 0)) throw new InputError("composition", comp, "a steel whose cementite is richer in C than austenite");
    const f = (acmCarbon * mass - 100 * carbon) / denominator;
    dissolvedFraction.M3C = Math.min(1, Math.max(0, f));
    method.M3C = "acm-lever-rule";
    const alloyed = c.Cr + c.Mn + c.Mo + c.W + c.V + c.Ni + c.Si;
    if (alloyed > 1) warnings.push("The Acm line is that of binary Fe–C; Cr, Mn and other alloying shift it, so the cementite fraction is approximate.");
    if (c.C < EUTECTOID_C && tempC < 910) warnings.push("Hypoeutectoid steel: ferrite may remain below A3; this model puts all matrix into austenite.");
  }
  return { dissolvedFraction, method, acmCarbonMassPct: acmCarbon, warnings };
}
