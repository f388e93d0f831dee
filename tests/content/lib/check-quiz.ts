/**
 * Checks one quiz definition: structure, and that its answer key grades as correct
 * through the real grader (server/quiz/grade.ts) — for parameterised questions at
 * many seeds, with the worked expression agreeing with the core's computation.
 */
import type { NumericQuestion, QuizDefinition } from "../../../shared/quiz/definition";
import { drawParams } from "../../../server/quiz/draw";
import { answerKey, evaluateExpression, gradeQuestion, unitMenu } from "../../../server/quiz/grade";
import { convertValue, isPhysicalUnit } from "../../../server/quiz/units";
import type { CourseContext, Problem, Rule } from "./types";

/** Seeds every parameterised question is drawn and graded at. */
export const CHECK_SEEDS = [1, 2, 3, 7, 42, 99, 123, 2024, 31337, 65535, 100003, 999983, 2 ** 31 - 1, 17, 5, 11, 13, 19, 23, 29];

export function checkQuiz(quiz: QuizDefinition, context: CourseContext, expectedId?: string): Problem[] {
  const where = `quiz ${quiz.id}`;
  const problems: Problem[] = [];
  const add = (rule: Rule, message: string) => problems.push({ where, rule, message });

  if (expectedId !== undefined && quiz.id !== expectedId) add("quiz-definition", `The quiz id “${quiz.id}” must match its file name “${expectedId}.ts”.`);
  if (!/^[a-z0-9][a-z0-9-]*$/.test(quiz.id)) add("quiz-definition", "Quiz ids are lower-case letters, digits and hyphens.");
  if (!quiz.title?.trim()) add("quiz-definition", "The quiz has no title.");
  if (!quiz.questions.length) add("quiz-definition", "The quiz has no questions.");
  if (quiz.passFraction !== undefined && !(quiz.passFraction > 0 && quiz.passFraction <= 1)) add("quiz-definition", "passFraction must be in (0, 1].");
  if (!context.modules.some((m) => m.lessons.includes(quiz.lessonSlug))) add("quiz-definition", `The quiz ends lesson “${quiz.lessonSlug}”, which is not in the manifest.`);

  const ids = new Set<string>();
  for (const question of quiz.questions) {
    const q = `question ${question.id}`;
    if (ids.has(question.id)) add("quiz-definition", `Question id “${question.id}” is used twice.`);
    ids.add(question.id);
    if (!question.prompt?.trim()) add("quiz-definition", `${q} has no prompt.`);
    if (!question.explanation?.trim()) add("quiz-definition", `${q} has no explanation.`);
    if (question.points !== undefined && !(question.points > 0)) add("quiz-definition", `${q}: points must be positive.`);

    switch (question.kind) {
      case "single":
      case "multiple": {
        const optionIds = question.options.map((o) => o.id);
        if (optionIds.length < 2) add("quiz-definition", `${q} needs at least two options.`);
        if (new Set(optionIds).size !== optionIds.length) add("quiz-definition", `${q} repeats an option id.`);
        const keys = question.kind === "single" ? [question.answer] : question.answers;
        if (question.kind === "multiple" && keys.length === 0) add("quiz-definition", `${q} lists no right answers.`);
        for (const key of keys) if (!optionIds.includes(key)) add("quiz-key", `${q}: the answer “${key}” is not one of the options.`);
        for (const key of Object.keys(question.feedback ?? {})) if (!optionIds.includes(key)) add("quiz-definition", `${q}: feedback for unknown option “${key}”.`);
        break;
      }
      case "numeric":
        checkNumeric(question, q, add);
        break;
      case "sim-task":
        if (!context.simIds.has(question.simulation)) {
          add("quiz-definition", `${q} embeds unknown simulation “${question.simulation}”.`);
          break;
        }
        if (!context.simSchemas.has(question.simulation)) add("quiz-definition", `${q}: simulation “${question.simulation}” has no paramsSchema to parse submissions with.`);
        else if (question.initial) {
          const parsed = context.simSchemas.get(question.simulation)!.safeParse(question.initial);
          if (!parsed.success) add("quiz-definition", `${q}: the simulation rejects the initial parameters: ${parsed.error.issues[0].message}`);
        }
        break;
    }

    // The key must grade as correct through the real grader, at every seed.
    const seeds = question.kind === "numeric" && question.params ? CHECK_SEEDS : [1];
    for (const seed of seeds) {
      let outcome;
      try {
        outcome = gradeQuestion(question, answerKey(question, seed), seed, { simSchemas: context.simSchemas });
      } catch (error) {
        add("quiz-key", `${q}: grading the answer key threw at seed ${seed}: ${(error as Error).message}`);
        break;
      }
      if (!outcome.correct) {
        add("quiz-key", `${q}: the answer key is graded wrong at seed ${seed} (${outcome.feedback ?? outcome.working ?? "no detail"}).`);
        break;
      }
    }
  }
  return problems;
}

function checkNumeric(question: NumericQuestion, q: string, add: (rule: Rule, message: string) => void): void {
  const params = question.params ?? {};
  for (const [name, range] of Object.entries(params)) {
    if (!(range.step > 0) || !(range.max >= range.min)) add("quiz-definition", `${q}: parameter ${name} needs min ≤ max and step > 0.`);
    if (!question.prompt.includes(`{${name}}`)) add("quiz-definition", `${q}: the prompt never shows parameter {${name}}.`);
  }
  for (const match of question.prompt.matchAll(/\{([A-Za-z_]\w*)\}/g)) {
    if (!(match[1] in params)) add("quiz-definition", `${q}: the prompt shows {${match[1]}}, which is not a parameter.`);
  }
  const tol = question.tolerance;
  if (!("abs" in tol ? tol.abs > 0 : tol.rel > 0)) add("quiz-definition", `${q}: the tolerance must be positive.`);
  for (const other of unitMenu(question).slice(1)) {
    // Labels (HRC, %, …) convert to nothing but themselves; physical units must share a dimension.
    if (!isPhysicalUnit(question.unit) || !isPhysicalUnit(other) || convertValue(1, other, question.unit) === null) {
      add("quiz-definition", `${q}: accepted unit “${other}” cannot be converted to “${question.unit}”.`);
    }
  }

  const seeds = question.params ? CHECK_SEEDS : [1];
  for (const seed of seeds) {
    const values = drawParams(question, seed);
    let expected: number;
    try {
      expected = question.compute(values);
    } catch (error) {
      add("quiz-key", `${q}: compute() threw for ${JSON.stringify(values)}: ${(error as Error).message}`);
      return;
    }
    if (!Number.isFinite(expected)) {
      add("quiz-key", `${q}: compute() gave ${expected} for ${JSON.stringify(values)}.`);
      return;
    }
    // The key, converted into every other accepted unit, must still be right.
    for (const other of unitMenu(question).slice(1)) {
      const converted = convertValue(expected, question.unit, other);
      if (converted === null) continue;
      const outcome = gradeQuestion(question, { kind: "numeric", value: converted, unit: other }, seed);
      if (!outcome.correct) add("quiz-key", `${q}: the key converted to ${other} is graded wrong at seed ${seed}.`);
    }
    if (question.expression) {
      let value: number;
      try {
        value = evaluateExpression(question.expression, values);
      } catch (error) {
        add("quiz-expression", `${q}: the expression “${question.expression}” cannot be evaluated: ${(error as Error).message}`);
        return;
      }
      const outcome = gradeQuestion(question, { kind: "numeric", value, unit: question.unit }, seed);
      if (!outcome.correct) {
        add("quiz-expression", `${q}: the expression gives ${value} but compute() gives ${expected} for ${JSON.stringify(values)}.`);
        return;
      }
    }
  }
}
