/**
 * Per-attempt parameter draws. Each attempt stores one seed; every parameterised
 * question derives its own generator from that seed and its id, so the draws
 * replay exactly at grading time and do not shift when another question is edited.
 */
import { createRandom } from "../../shared/metallurgy/random";
import type { ParamRange, QuestionDefinition } from "../../shared/quiz/definition";

/** FNV-1a, 32 bit: a stable, dependency-free hash of a question id. */
function hashString(text: string): number {
  let hash = 0x811c9dc5;
  for (let i = 0; i < text.length; i += 1) {
    hash ^= text.charCodeAt(i);
    hash = Math.imul(hash, 0x01000193);
  }
  return hash >>> 0;
}

/** Number of decimals a grid step needs (0.05 → 2, 25 → 0). */
export function stepDecimals(step: number): number {
  const text = String(step);
  if (text.includes("e-")) return Number(text.split("e-")[1]);
  const dot = text.indexOf(".");
  return dot < 0 ? 0 : text.length - dot - 1;
}

/** A value uniform on the grid min, min+step, …, ≤ max. */
export function drawOnGrid(range: ParamRange, random: () => number): number {
  const count = Math.floor((range.max - range.min) / range.step + 1e-9) + 1;
  const index = Math.min(count - 1, Math.floor(random() * count));
  const decimals = Math.max(stepDecimals(range.step), stepDecimals(range.min));
  return Number((range.min + index * range.step).toFixed(decimals));
}

/** The parameter values of one question in the attempt with `seed` ({} for a fixed question). */
export function drawParams(question: QuestionDefinition, seed: number): Record<string, number> {
  if (question.kind !== "numeric" || !question.params) return {};
  const random = createRandom((seed ^ hashString(question.id)) >>> 0);
  const values: Record<string, number> = {};
  // Sorted names: the draw must not depend on object key order in the source file.
  for (const name of Object.keys(question.params).sort()) {
    values[name] = drawOnGrid(question.params[name], random);
  }
  return values;
}

/** Replace `{name}` placeholders with the drawn values, formatted to their grid step. */
export function substitutePrompt(question: QuestionDefinition, values: Record<string, number>): string {
  if (question.kind !== "numeric" || !question.params) return question.prompt;
  const params = question.params;
  return question.prompt.replace(/\{([A-Za-z_][A-Za-z0-9_]*)\}/g, (match, name: string) => {
    if (!(name in values)) return match;
    const decimals = Math.max(stepDecimals(params[name].step), stepDecimals(params[name].min));
    return values[name].toFixed(decimals);
  });
}
