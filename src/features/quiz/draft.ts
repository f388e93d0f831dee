/** The answers being written, before they become a submission. */
import type { PublicQuestion, QuizAnswer } from "@shared/api/quizzes";

export type DraftAnswer =
  | { kind: "single"; choice: string | null }
  | { kind: "multiple"; choices: string[] }
  | { kind: "numeric"; text: string; unit: string }
  | { kind: "sim-task"; params: Record<string, unknown> | null };

export type Draft = Record<string, DraftAnswer>;

export function emptyDraft(questions: PublicQuestion[]): Draft {
  const draft: Draft = {};
  for (const q of questions) {
    if (q.kind === "single") draft[q.id] = { kind: "single", choice: null };
    else if (q.kind === "multiple") draft[q.id] = { kind: "multiple", choices: [] };
    else if (q.kind === "numeric") draft[q.id] = { kind: "numeric", text: "", unit: q.units[0] };
    else draft[q.id] = { kind: "sim-task", params: null };
  }
  return draft;
}

/** "0,128", " 1 000.5 ", "1.2e3" → numbers; anything else → null. */
export function parseNumber(text: string): number | null {
  const clean = text.trim().replace(/\s+/g, "").replace(/−/g, "-").replace(/,(?=\d+$)/, ".");
  if (!/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(clean)) return null;
  const value = Number(clean);
  return Number.isFinite(value) ? value : null;
}

export function isAnswered(answer: DraftAnswer | undefined): boolean {
  if (!answer) return false;
  switch (answer.kind) {
    case "single":
      return answer.choice !== null;
    case "multiple":
      return answer.choices.length > 0;
    case "numeric":
      return answer.text.trim() !== "";
    case "sim-task":
      return true;
  }
}

export interface BuiltAnswers {
  answers: Record<string, QuizAnswer>;
  /** Question ids whose numeric text is not a number. */
  invalid: string[];
}

export function buildAnswers(questions: PublicQuestion[], draft: Draft): BuiltAnswers {
  const answers: Record<string, QuizAnswer> = {};
  const invalid: string[] = [];
  for (const q of questions) {
    const a = draft[q.id];
    if (!a) continue;
    if (a.kind === "single" && a.choice !== null) answers[q.id] = { kind: "single", choice: a.choice };
    else if (a.kind === "multiple" && a.choices.length) answers[q.id] = { kind: "multiple", choices: a.choices };
    else if (a.kind === "numeric" && a.text.trim() !== "") {
      const value = parseNumber(a.text);
      if (value === null) invalid.push(q.id);
      else answers[q.id] = { kind: "numeric", value, unit: a.unit };
    } else if (a.kind === "sim-task" && q.kind === "sim-task") {
      // A simulation that has not reported its settings is submitted as it started.
      answers[q.id] = { kind: "sim-task", params: a.params ?? q.initial };
    }
  }
  return { answers, invalid };
}
