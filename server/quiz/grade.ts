/**
 * The quiz grader: one function per question kind, all pure. The server grades
 * submissions with it, and the content check grades every answer key with it,
 * so a key that the grader would mark wrong cannot ship.
 */
import { evaluate } from "mathjs";
import type { QuestionResult, QuizAnswer } from "../../shared/api/quizzes";
import { unitLabel, unitSuffix } from "../../shared/api/quizzes";
import type {
  MultipleChoiceQuestion,
  NumericQuestion,
  QuestionDefinition,
  QuizDefinition,
  SimulationTaskQuestion,
  SingleChoiceQuestion,
} from "../../shared/quiz/definition";
import { drawParams } from "./draw";
import { formatNumber, formatParams, formatQuantity } from "./format";
import type { SimSchemas } from "./sim-params";
import { convertValue, isTemperature, TEMPERATURE_UNITS } from "./units";

const UNANSWERED = "—";
/** Slack for floating-point noise on top of the author's tolerance. */
const FLOAT_SLACK = 1e-9;

export function questionPoints(question: QuestionDefinition): number {
  return question.points ?? 1;
}

function result(
  question: QuestionDefinition,
  correct: boolean,
  fields: Pick<QuestionResult, "given" | "correctAnswer"> & Partial<QuestionResult>,
): QuestionResult {
  const points = questionPoints(question);
  return {
    questionId: question.id,
    kind: question.kind,
    correct,
    points,
    pointsAwarded: correct ? points : 0,
    explanation: question.explanation,
    ...fields,
  };
}

function wrongKind(question: QuestionDefinition, correctAnswer: string, answer: QuizAnswer | undefined): QuestionResult {
  return result(question, false, {
    given: UNANSWERED,
    correctAnswer,
    feedback: answer ? "This answer was of the wrong kind for the question." : "Not answered.",
  });
}

// ---------- single / multiple choice ----------

function optionText(question: SingleChoiceQuestion | MultipleChoiceQuestion, id: string): string {
  return question.options.find((option) => option.id === id)?.text ?? `(unknown option “${id}”)`;
}

export function gradeSingle(question: SingleChoiceQuestion, answer: QuizAnswer | undefined): QuestionResult {
  const correctAnswer = optionText(question, question.answer);
  if (answer?.kind !== "single") return wrongKind(question, correctAnswer, answer);
  const correct = answer.choice === question.answer;
  return result(question, correct, {
    given: optionText(question, answer.choice),
    correctAnswer,
    feedback: correct ? undefined : question.feedback?.[answer.choice],
  });
}

/** Several options in one line: "a; b", without a sentence's own full stop before each "; ". */
function optionList(question: MultipleChoiceQuestion, ids: readonly string[]): string {
  return ids.map((id) => optionText(question, id).replace(/[.;]\s*$/, "")).join("; ");
}

export function gradeMultiple(question: MultipleChoiceQuestion, answer: QuizAnswer | undefined): QuestionResult {
  const correctAnswer = optionList(question, question.answers);
  if (answer?.kind !== "multiple") return wrongKind(question, correctAnswer, answer);
  const chosen = new Set(answer.choices);
  const wanted = new Set(question.answers);
  const missing = question.answers.filter((id) => !chosen.has(id));
  const extra = [...chosen].filter((id) => !wanted.has(id));
  const correct = missing.length === 0 && extra.length === 0;
  const notes: string[] = [];
  if (!correct) {
    if (missing.length) notes.push(`Missed ${missing.length} correct option${missing.length > 1 ? "s" : ""}.`);
    for (const id of extra) {
      notes.push(question.feedback?.[id] ?? `“${optionText(question, id)}” does not belong.`);
    }
  }
  return result(question, correct, {
    given: answer.choices.length ? optionList(question, answer.choices) : UNANSWERED,
    correctAnswer,
    feedback: notes.length ? notes.join(" ") : undefined,
  });
}

// ---------- numeric ----------

export function allowedDeviation(question: NumericQuestion, correctValue: number): number {
  const tol = question.tolerance;
  const base = "abs" in tol ? tol.abs : tol.rel * Math.abs(correctValue);
  return base + FLOAT_SLACK * Math.max(1, Math.abs(correctValue));
}

export function unitMenu(question: NumericQuestion): string[] {
  return [question.unit, ...(question.acceptedUnits ?? []).filter((u) => u !== question.unit)];
}

/** Evaluate the question's worked expression with mathjs over the drawn params. */
export function evaluateExpression(expression: string, params: Record<string, number>): number {
  const value: unknown = evaluate(expression, { ...params });
  if (typeof value !== "number") throw new Error(`Expression “${expression}” did not evaluate to a plain number.`);
  return value;
}

function describeTolerance(question: NumericQuestion, correctValue: number): string {
  const tol = question.tolerance;
  if ("abs" in tol) return `±${formatNumber(tol.abs)}${unitSuffix(question.unit)}`;
  return `±${formatNumber(tol.rel * 100)} % (±${formatNumber(tol.rel * Math.abs(correctValue))}${unitSuffix(question.unit)})`;
}

function working(question: NumericQuestion, params: Record<string, number>, correctValue: number): string | undefined {
  if (!question.expression) return undefined;
  const values = Object.entries(params)
    .map(([name, value]) => `${name} = ${value}`)
    .join(", ");
  const computed = `${question.expression} = ${formatQuantity(correctValue, question.unit, question.decimals)}`;
  return values ? `${computed}, with ${values}` : computed;
}

export function gradeNumeric(question: NumericQuestion, answer: QuizAnswer | undefined, seed: number): QuestionResult {
  const params = drawParams(question, seed);
  const correctValue = question.compute(params);
  const deviation = allowedDeviation(question, correctValue);
  const correctAnswer = `${formatQuantity(correctValue, question.unit, question.decimals)} (accepted ${describeTolerance(question, correctValue)})`;
  const base = { correctAnswer, working: working(question, params, correctValue) };
  if (answer?.kind !== "numeric") return { ...wrongKind(question, correctAnswer, answer), working: base.working };

  const given = `${formatNumber(answer.value)}${unitSuffix(answer.unit)}`;
  const menu = unitMenu(question);
  if (!menu.includes(answer.unit)) {
    return result(question, false, { ...base, given, feedback: `“${unitLabel(answer.unit)}” is not a unit offered for this question.` });
  }
  const converted = convertValue(answer.value, answer.unit, question.unit);
  if (converted !== null && Math.abs(converted - correctValue) <= deviation) {
    return result(question, true, { ...base, given });
  }

  // Would the same number be right in another unit? Then the learner mixed up units.
  const candidates = new Set(menu);
  if (isTemperature(question.unit)) TEMPERATURE_UNITS.forEach((u) => candidates.add(u));
  candidates.delete(answer.unit);
  for (const candidate of candidates) {
    const reread = convertValue(answer.value, candidate, question.unit);
    if (reread !== null && Math.abs(reread - correctValue) <= deviation) {
      return result(question, false, {
        ...base,
        given,
        feedback: `Your number is right in ${unitLabel(candidate)}, but you chose ${unitLabel(answer.unit)}: check the unit.`,
      });
    }
  }
  const off = converted === null ? null : converted - correctValue;
  return result(question, false, {
    ...base,
    given,
    feedback:
      off === null
        ? "That unit cannot be converted to the one asked for."
        : `Off by ${formatNumber(Math.abs(off))}${unitSuffix(question.unit)}; the accepted range is ${describeTolerance(question, correctValue)}.`,
  });
}

// ---------- simulation task ----------

export interface GradeContext {
  /** Parameter schemas of the simulations, by id; submitted states are parsed with them. */
  simSchemas?: SimSchemas;
}

export function parseSimParams(
  simulation: string,
  params: Record<string, unknown>,
  context: GradeContext = {},
): { ok: true; params: Record<string, unknown> } | { ok: false; message: string } {
  const schema = context.simSchemas?.get(simulation);
  if (!schema) return { ok: true, params };
  const parsed = schema.safeParse(params);
  if (parsed.success) return { ok: true, params: parsed.data as Record<string, unknown> };
  const issue = parsed.error.issues[0];
  return { ok: false, message: `${issue.path.join(".") || "settings"}: ${issue.message}` };
}

export function gradeSimTask(question: SimulationTaskQuestion, answer: QuizAnswer | undefined, context: GradeContext = {}): QuestionResult {
  const correctAnswer = `For example: ${formatParams(question.exampleSolution)}`;
  if (answer?.kind !== "sim-task") return wrongKind(question, correctAnswer, answer);
  const given = formatParams(answer.params);
  const parsed = parseSimParams(question.simulation, answer.params, context);
  if (!parsed.ok) {
    return result(question, false, { given, correctAnswer, feedback: `The simulation settings were not valid (${parsed.message}).` });
  }
  try {
    const outcome = question.check(parsed.params);
    return result(question, outcome.correct, { given, correctAnswer, working: outcome.detail });
  } catch (error) {
    // The core rejects impossible inputs with an InputError; that is a wrong answer, not a server fault.
    const message = error instanceof Error ? error.message : String(error);
    return result(question, false, { given, correctAnswer, feedback: `The science core could not evaluate these settings: ${message}` });
  }
}

// ---------- whole quiz ----------

export function gradeQuestion(
  question: QuestionDefinition,
  answer: QuizAnswer | undefined,
  seed: number,
  context: GradeContext = {},
): QuestionResult {
  switch (question.kind) {
    case "single":
      return gradeSingle(question, answer);
    case "multiple":
      return gradeMultiple(question, answer);
    case "numeric":
      return gradeNumeric(question, answer, seed);
    case "sim-task":
      return gradeSimTask(question, answer, context);
  }
}

export interface GradedQuiz {
  score: number;
  maxScore: number;
  passed: boolean;
  results: QuestionResult[];
}

export function passFraction(quiz: QuizDefinition): number {
  return quiz.passFraction ?? 0.7;
}

export function gradeQuiz(
  quiz: QuizDefinition,
  answers: Record<string, QuizAnswer>,
  seed: number,
  context: GradeContext = {},
): GradedQuiz {
  const results = quiz.questions.map((question) =>
    gradeQuestion(question, Object.hasOwn(answers, question.id) ? answers[question.id] : undefined, seed, context),
  );
  const score = results.reduce((sum, r) => sum + r.pointsAwarded, 0);
  const maxScore = results.reduce((sum, r) => sum + r.points, 0);
  return { score, maxScore, passed: maxScore > 0 && score >= passFraction(quiz) * maxScore - FLOAT_SLACK, results };
}

/** The answer the key says is right, in submission form (for tests and the content check). */
export function answerKey(question: QuestionDefinition, seed: number): QuizAnswer {
  switch (question.kind) {
    case "single":
      return { kind: "single", choice: question.answer };
    case "multiple":
      return { kind: "multiple", choices: [...question.answers] };
    case "numeric":
      return { kind: "numeric", value: question.compute(drawParams(question, seed)), unit: question.unit };
    case "sim-task":
      return { kind: "sim-task", params: { ...question.exampleSolution } };
  }
}
