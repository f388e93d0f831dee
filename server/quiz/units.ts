/**
 * Unit handling for numeric answers. Physical units (°C, K, µm, h, …) are converted
 * with mathjs; labels for dimensionless scales (%, HRC, HV, wt%) must match exactly,
 * because mathjs cannot (and should not) convert HRC into HV.
 */
import { unit as mathUnit } from "mathjs";

/** Scales that look like units to a learner but are not physical units. */
const LABELS = new Set(["%", "wt%", "at%", "HRC", "HV", "HB", "1", "", "ratio", "PREN"]);

export function isPhysicalUnit(token: string): boolean {
  if (LABELS.has(token)) return false;
  try {
    mathUnit(1, token);
    return true;
  } catch {
    return false;
  }
}

/**
 * `value` given in `from`, expressed in `to`; null when the two cannot be converted
 * (different dimensions, or labels that differ).
 */
export function convertValue(value: number, from: string, to: string): number | null {
  if (from === to) return value;
  if (!isPhysicalUnit(from) || !isPhysicalUnit(to)) return null;
  try {
    return mathUnit(value, from).toNumber(to);
  } catch {
    return null;
  }
}

/** Temperature units, for spotting a K/°C mix-up even when only one is on the menu. */
export const TEMPERATURE_UNITS = ["degC", "K"] as const;

export function isTemperature(token: string): boolean {
  return (TEMPERATURE_UNITS as readonly string[]).includes(token) || token === "degF";
}
