/** Number and duration formatting shared by the ingot, powder and alloy simulations' text. */
import { ALLOY_ELEMENTS } from "./params";

/** A model duration in words: "42 s", "12 min 30 s", "3 h 05 min", "2.1 ms". */
export function formatDuration(seconds: number): string {
  if (!Number.isFinite(seconds)) return "—";
  if (seconds < 1e-3) return `${(seconds * 1e6).toPrecision(2)} µs`;
  if (seconds < 1) return `${(seconds * 1e3).toPrecision(2)} ms`;
  if (seconds < 60) return `${seconds < 10 ? seconds.toFixed(1) : Math.round(seconds)} s`;
  if (seconds < 3600) {
    const m = Math.floor(seconds / 60);
    const s = Math.round(seconds - m * 60);
    return s === 60 ? `${m + 1} min` : `${m} min ${String(s).padStart(2, "0")} s`;
  }
  const h = Math.floor(seconds / 3600);
  const m = Math.round((seconds - h * 3600) / 60);
  return m === 60 ? `${h + 1} h` : `${h} h ${String(m).padStart(2, "0")} min`;
}

/** Significant figures without trailing exponent noise: 0.000123 → "0.000123", 12345 → "12,345". */
export function formatNumber(value: number, digits = 3): string {
  if (!Number.isFinite(value)) return "—";
  if (value === 0) return "0";
  const abs = Math.abs(value);
  if (abs >= 1e5 || abs < 1e-3) return value.toExponential(digits - 1).replace("e+", "e");
  const decimals = Math.max(0, digits - 1 - Math.floor(Math.log10(abs)));
  return value.toLocaleString("en-GB", { maximumFractionDigits: decimals, minimumFractionDigits: 0 });
}

/** A power of ten in plain text, e.g. 3.2 × 10⁴; values near 1 stay plain unless `always` (a column of them). */
export function formatScientific(value: number, digits = 2, always = false): string {
  if (!Number.isFinite(value) || value === 0) return formatNumber(value);
  const exp = Math.floor(Math.log10(Math.abs(value)));
  if (!always && exp >= -2 && exp <= 3) return formatNumber(value, digits);
  const mantissa = value / 10 ** exp;
  return `${mantissa.toFixed(digits - 1)} × 10${superscript(exp)}`;
}

const SUPERSCRIPTS: Record<string, string> = { "-": "⁻", "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹" };

export function superscript(n: number): string {
  return String(n)
    .split("")
    .map((c) => SUPERSCRIPTS[c] ?? c)
    .join("");
}

/** Mass percent with sensible decimals: 0.05 %, 1.45 %, 17.0 %. */
export function formatMassPct(value: number): string {
  if (!Number.isFinite(value)) return "—";
  const decimals = value < 1 ? 2 : value < 10 ? 2 : 1;
  return `${value.toFixed(decimals)} %`;
}

/** "1.05 C, 14 Cr, 4 Mo": the elements present, in the explorer's order; "pure iron" when none.
 * A no-break space keeps each number with its element when the line wraps. */
export function compositionText(composition: Partial<Record<(typeof ALLOY_ELEMENTS)[number], number>>): string {
  const parts = ALLOY_ELEMENTS.filter((el) => (composition[el] ?? 0) > 0).map((el) => `${composition[el]}\u00a0${el}`);
  return parts.length ? parts.join(", ") : "pure iron";
}
