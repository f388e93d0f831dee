/** Number and answer formatting for graded results. */
import { unitSuffix } from "../../shared/api/quizzes";

/** A value with `decimals` places, or 4 significant figures when the author gave none. */
export function formatNumber(value: number, decimals?: number): string {
  if (!Number.isFinite(value)) return String(value);
  if (decimals !== undefined) return value.toFixed(decimals);
  if (value === 0) return "0";
  const magnitude = Math.floor(Math.log10(Math.abs(value)));
  const places = Math.max(0, 3 - magnitude);
  return Number(value.toFixed(Math.min(places, 10))).toString();
}

export function formatQuantity(value: number, unit: string, decimals?: number): string {
  return `${formatNumber(value, decimals)}${unitSuffix(unit)}`;
}

/** Simulation parameters written out compactly: "crMassPct 13, environment salt". */
export function formatParams(params: Record<string, unknown>): string {
  const parts = Object.entries(params).map(([key, value]) => `${key} ${typeof value === "object" ? JSON.stringify(value) : String(value)}`);
  return parts.length ? parts.join(", ") : "(defaults)";
}
