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
 * Warning for cementite steels with chromium. science-reference §5.2 gives only the binary Acm line and no
 * chromium correction for it (its one Cr term is Andrews' Ac1 +16.9 °C per % Cr, [Mem]), so the effect is
 * not modelled; this says so instead of inventing a shift.
 */
export function chromiumAcmWarning(chromiumMassPct: number, cementiteChromiumShare: number | undefined): string {
  const share = cementiteChromiumShare === undefined ? "" : ` (here ${cementiteChromiumShare.toFixed(3)} of its metal sites)`;
  return (
    `Chromium's effect on cementite dissolution is not modelled: the dissolved share comes from the binary Fe–C Acm line, ` +
    `so this steel (${chromiumMassPct} % Cr) gets the same carbon in solution as a plain-carbon steel of equal carbon at the same temperature. ` +
    `In real steels chromium concentrates in the cementite${share} and raises the critical temperatures (Andrews: Ac1 +16.9 °C per % Cr), ` +
    `so more carbide stays undissolved and less carbon enters solution than shown.`
  );
}

/**
 * Warning for high-speed steels (an M6C population). The M6C and MC windows are [App] heuristics with no source
 * for these steels; nothing in science-reference §2 gives their carbide solubility, so the limitation is stated.
 */
export const HIGH_SPEED_STEEL_WARNING =
  "High-speed steel (M6C present): the M6C and MC dissolution windows are app heuristics, not calibrated on these steels, and the allocation " +
  "ties most carbon to M6C. The carbon in solution, and the as-quenched hardness computed from it, therefore read low and Ms reads high: " +
  "M2 from 1200 °C gives about 0.35 % C and 53 HRC here, while roughly 0.5 % C in solution and 63–66 HRC hardened and tempered are typical " +
  "(from memory). Part of that hardness comes from secondary hardening when tempered near 540–560 °C, which the app does not model.";

/**
 * Dissolved fraction of each CARB-1 carbide after austenitizing at `austenitizingTempC` (°C, 0–1400).
 * Cementite (M3C): from the Acm lever rule (science-reference §5.2, [Computed] straight Acm line) — the
 * fraction that leaves austenite at C_γ(T) with the remaining cementite, exact for binary Fe–C. Chromium's
 * effect (it enriches cementite and delays its dissolution) has no sourced correction and is not modelled:
 * a warning says so (chromiumAcmWarning); other alloying gets a general warning. Alloy carbides (MC, M6C,
 * M7C3, M23C6): [App] linear windows, see DEFAULT_DISSOLUTION_WINDOWS; with M6C present (high-speed steels)
 * a warning says the windows are uncalibrated there. Below 727 °C nothing dissolves (no austenite).
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
  if (allocation.phases.some((p) => p.type === "M6C")) warnings.push(HIGH_SPEED_STEEL_WARNING);

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
    if (c.Cr > 0) warnings.push(chromiumAcmWarning(c.Cr, cementite.chromiumShare));
    const otherAlloying = c.Mn + c.Mo + c.W + c.V + c.Ni + c.Si;
    if (otherAlloying > 1) warnings.push("The Acm line is that of binary Fe–C; Mn, Si and other alloying also shift it, so the cementite fraction is approximate.");
    if (c.C < EUTECTOID_C && tempC < 910) warnings.push("Hypoeutectoid steel: ferrite may remain below A3; this model puts all matrix into austenite.");
  }
  return { dissolvedFraction, method, acmCarbonMassPct: acmCarbon, warnings };
}
