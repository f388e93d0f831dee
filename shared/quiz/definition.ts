/**
 * Quiz definitions as authors write them (content/quizzes/<quizId>.ts). Server-only at run time:
 * answer keys and explanations live here and reach a learner only in a graded result.
 * Pure data + pure functions; the grader in server/quiz/ evaluates them with the science core.
 */

/** A value drawn per attempt from the attempt's seeded generator: uniform on a grid min..max by step. */
export interface ParamRange {
  min: number;
  max: number;
  step: number;
}

export interface ChoiceOption {
  id: string;
  /** Plain text or a short inline-markdown string (no HTML). */
  text: string;
}

interface QuestionBase {
  id: string;
  /** Prompt text. In numeric questions `{name}` placeholders are replaced by the drawn parameter values. */
  prompt: string;
  /** Shown only after submission: why the right answer is right. */
  explanation: string;
  /** Marks for a fully correct answer (default 1). */
  points?: number;
}

export interface SingleChoiceQuestion extends QuestionBase {
  kind: "single";
  options: ChoiceOption[];
  answer: string;
  /** Optional per-wrong-option feedback, keyed by option id. */
  feedback?: Record<string, string>;
}

export interface MultipleChoiceQuestion extends QuestionBase {
  kind: "multiple";
  options: ChoiceOption[];
  /** All ids that must be selected; any other selected id makes the answer wrong. */
  answers: string[];
  feedback?: Record<string, string>;
}

export interface NumericQuestion extends QuestionBase {
  kind: "numeric";
  /** Parameters drawn per attempt; omit for a fixed question. */
  params?: Record<string, ParamRange>;
  /** The correct value computed with the science core from the drawn params (units of `unit`). */
  compute: (params: Record<string, number>) => number;
  /**
   * Optional mathjs expression over the params that shows the working in the explanation;
   * the content check asserts it agrees with `compute` (so the worked formula cannot drift from the core).
   */
  expression?: string;
  /** The unit the answer is expected in, as mathjs understands it (e.g. "degC", "K", "nm", "um", "h", "min"), or a label for dimensionless quantities ("%", "HRC", "HV", "wt%", "in", "1"). */
  unit: string;
  /** Other units a learner may pick in the unit menu; physical ones are converted with mathjs, labels must match exactly. */
  acceptedUnits?: string[];
  tolerance: { abs: number } | { rel: number };
  /** Decimal places to show the correct answer with. */
  decimals?: number;
}

export interface SimulationTaskQuestion extends QuestionBase {
  kind: "sim-task";
  /** Simulation id from src/lab/registry.ts (e.g. "alloy", "passive-film"). */
  simulation: string;
  /** Initial parameters the embedded simulation opens with. */
  initial?: Record<string, unknown>;
  /**
   * The server recomputes with the science core from the submitted simulation parameters
   * and says whether they meet the task; `detail` explains what the computed values were.
   */
  check: (submitted: Record<string, unknown>) => { correct: boolean; detail: string };
  /** A set of parameters that satisfies the task (the content check grades it and expects `correct`). */
  exampleSolution: Record<string, unknown>;
}

export type QuestionDefinition = SingleChoiceQuestion | MultipleChoiceQuestion | NumericQuestion | SimulationTaskQuestion;

export interface QuizDefinition {
  /** Stable id, also the file name: e.g. "why-stainless-1". */
  id: string;
  /** The lesson this quiz ends (content/<module>/<lesson>.mdx slug). */
  lessonSlug: string;
  title: string;
  /** Fraction of points needed to pass (default 0.7). */
  passFraction?: number;
  questions: QuestionDefinition[];
}

/** Identity helper that gives authors type checking. */
export function defineQuiz(quiz: QuizDefinition): QuizDefinition {
  return quiz;
}
