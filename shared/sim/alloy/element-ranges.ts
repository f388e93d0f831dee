import type { Element } from "../../metallurgy/composition";

/**
 * Slider ranges (mass %) for the elements a learner may set in the ingot, powder and
 * alloy simulations. They bound what the controls offer and what a preset or URL may ask
 * for; the science core still warns when a value is outside a model's calibration.
 * C stops at 2.5 % because the carbide allocation rejects cast-iron carbon (above 3.5 %)
 * and warns above 2.5 %.
 */
export const ELEMENT_RANGE_MASS_PCT = {
  C: { min: 0, max: 2.5, step: 0.01 },
  Cr: { min: 0, max: 30, step: 0.1 },
  V: { min: 0, max: 15, step: 0.05 },
  W: { min: 0, max: 20, step: 0.1 },
  Mo: { min: 0, max: 10, step: 0.05 },
  Mn: { min: 0, max: 2, step: 0.05 },
  Si: { min: 0, max: 2, step: 0.05 },
  Ni: { min: 0, max: 12, step: 0.1 },
  N: { min: 0, max: 0.6, step: 0.01 },
} as const satisfies Partial<Record<Element, { min: number; max: number; step: number }>>;

export type RangedElement = keyof typeof ELEMENT_RANGE_MASS_PCT;

/** Snap a value to an element's slider step and clamp it into range (for controls and URLs). */
export function snapToElementRange(element: RangedElement, value: number): number {
  const { min, max, step } = ELEMENT_RANGE_MASS_PCT[element];
  if (!Number.isFinite(value)) return min;
  const clamped = Math.min(max, Math.max(min, value));
  const snapped = Math.round(clamped / step) * step;
  // Avoid 0.30000000000000004 in URLs and labels.
  return Number(snapped.toFixed(decimalsOf(step)));
}

export function decimalsOf(step: number): number {
  const text = String(step);
  const dot = text.indexOf(".");
  return dot < 0 ? 0 : text.length - dot - 1;
}
