import { validateComposition, type Composition, type Element } from "../composition";
import { InputError } from "../errors";
import type { WithWarnings } from "../validate";
import { PARTITION_DATA, type PrimaryPhase } from "./partition-data";

/** Melting point used by the linear liquidus formula, °C. */
const BASE_TEMP_C = 1536;

/**
 * Liquidus depression per mass % in the low-alloy liquidus formula, °C/mass %.
 * Source: science-reference §3.3 [Checked: steelworks implementation]; V = 2 [Mem].
 * Ti (18) and Al (3.6) are part of the published formula but not of the core's Composition.
 */
export const LIQUIDUS_SLOPE_C_PER_MASS_PCT: Readonly<Partial<Record<Element, number>>> = Object.freeze({
  C: 78,
  Si: 7.6,
  Mn: 4.9,
  P: 34,
  S: 30,
  Cu: 5,
  Ni: 3.1,
  Mo: 2,
  Cr: 1.3,
  V: 2,
});

function calibrationWarnings(comp: Required<Composition>): string[] {
  const warnings: string[] = [];
  if (comp.C > 1.0) warnings.push(`C = ${comp.C} % is above the liquidus formula's calibration (C ≲ 0.5–0.8 %, warn above 1.0 %); treat the result as an extrapolation.`);
  if (comp.Cr > 5) warnings.push(`Cr = ${comp.Cr} % is above the liquidus formula's calibration (low-alloy steels, Cr ≤ 5 %); treat the result as an extrapolation.`);
  return warnings;
}

/**
 * Liquidus temperature of a low-alloy steel, °C:
 * T_L = 1536 − (78C + 7.6Si + 4.9Mn + 34P + 30S + 5Cu + 3.1Ni + 2Mo + 1.3Cr + 2V).
 * Warns above 1.0 % C or 5 % Cr (outside calibration) and for elements without a term (W, N).
 * Source: science-reference §3.3 [Checked: steelworks implementation; V term Mem].
 */
export function liquidusTempC(comp: Composition): WithWarnings<number> {
  const c = validateComposition(comp);
  const warnings = calibrationWarnings(c);
  let depression = 0;
  for (const [el, slope] of Object.entries(LIQUIDUS_SLOPE_C_PER_MASS_PCT) as [Element, number][]) depression += slope * c[el];
  for (const el of ["W", "N"] as const) {
    if (c[el] > 0) warnings.push(`${el} has no term in the liquidus formula and is ignored.`);
  }
  const value = BASE_TEMP_C - depression;
  if (value < 1000) warnings.push(`The linear liquidus (${value.toFixed(0)} °C) is far below any steel liquidus; the formula does not hold for this composition.`);
  return { value, warnings };
}

/**
 * Linearised multi-component equilibrium solidus, °C: T_S = 1536 − Σ m_i·C_i/k_i, with the
 * liquidus slopes m_i and partition coefficients k_i of PARTITION_DATA (austenite by default).
 * Elements lacking k or m (Cu, W, N) are left out with a warning.
 * Source: science-reference §3.3 [Pub, mem]; data §3.2.
 */
export function solidusTempC(comp: Composition, phase: PrimaryPhase = "gamma"): WithWarnings<number> {
  if (phase !== "gamma" && phase !== "delta") throw new InputError("phase", phase, "one of gamma, delta");
  const c = validateComposition(comp);
  const warnings = calibrationWarnings(c);
  let depression = 0;
  for (const [el, slope] of Object.entries(LIQUIDUS_SLOPE_C_PER_MASS_PCT) as [Element, number][]) {
    const datum = PARTITION_DATA[el];
    if (!datum) {
      if (c[el] > 0) warnings.push(`${el} has no partition coefficient and is left out of the solidus.`);
      continue;
    }
    depression += (slope * c[el]) / (phase === "gamma" ? datum.kGamma : datum.kDelta);
  }
  for (const el of ["W", "N"] as const) {
    if (c[el] > 0) warnings.push(`${el} has no liquidus slope and is left out of the solidus.`);
  }
  const value = BASE_TEMP_C - depression;
  if (value < 1000) warnings.push(`The linearised solidus (${value.toFixed(0)} °C) is far below any steel solidus; the linear model does not hold for this composition.`);
  return { value, warnings };
}

/**
 * Equilibrium freezing range ΔT = T_L − T_S, °C (liquidusTempC minus solidusTempC), with the
 * warnings of both. Source: science-reference §3.3.
 */
export function freezingRangeC(comp: Composition, phase: PrimaryPhase = "gamma"): WithWarnings<number> {
  const liquidus = liquidusTempC(comp);
  const solidus = solidusTempC(comp, phase);
  const warnings = [...new Set([...liquidus.warnings, ...solidus.warnings])];
  return { value: liquidus.value - solidus.value, warnings };
}
