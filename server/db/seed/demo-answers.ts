/**
 * Answers a demo student types into a quiz: right ones from the grader's own answer key (numbers
 * rounded as a person would write them), wrong ones of the kinds real learners make (a tempting
 * option, a missed or extra choice, a number off by a factor, the right number in the wrong unit,
 * simulation settings left at their start). They are only submissions: the grader scores them.
 */
import type { QuizAnswer } from "../../../shared/api/quizzes";
import type { RandomSource } from "../../../shared/metallurgy/random";
import type { NumericQuestion, QuestionDefinition, QuizDefinition } from "../../../shared/quiz/definition";
import { allowedDeviation, answerKey, unitMenu } from "../../quiz/grade";
import { drawParams } from "../../quiz/draw";
import { convertValue } from "../../quiz/units";
import { chooseIndices, pick } from "./demo-context";

/** The key's value rounded to 3 significant figures, if that is still inside the tolerance. */
function roundedRight(question: NumericQuestion, seed: number): QuizAnswer {
  const exact = question.compute(drawParams(question, seed));
  const rounded = Number(exact.toPrecision(3));
  const value = Math.abs(rounded - exact) <= allowedDeviation(question, exact) ? rounded : exact;
  return { kind: "numeric", value, unit: question.unit };
}

function wrongNumeric(question: NumericQuestion, seed: number, random: RandomSource): QuizAnswer {
  const exact = question.compute(drawParams(question, seed));
  const menu = unitMenu(question);
  // A temperature answered in the other scale's number is the classic slip.
  const other = menu.find((u) => u !== question.unit && convertValue(exact, question.unit, u) !== null);
  if (other && random() < 0.4) return { kind: "numeric", value: Number(exact.toPrecision(3)), unit: other };
  const factor = pick(random, [0.6, 0.8, 0.9, 1.15, 1.3, 1.6]);
  const off = exact === 0 ? 1 : exact * factor;
  // Make sure it is really outside the accepted range, however loose the tolerance.
  const deviation = allowedDeviation(question, exact);
  const value = Math.abs(off - exact) > deviation * 1.5 ? off : exact + Math.sign(factor - 1 || 1) * deviation * 3;
  return { kind: "numeric", value: Number(value.toPrecision(3)), unit: question.unit };
}

function wrongAnswer(question: QuestionDefinition, seed: number, random: RandomSource): QuizAnswer {
  switch (question.kind) {
    case "single": {
      const wrong = question.options.filter((o) => o.id !== question.answer);
      // Most who miss a question pick the same tempting option (the first wrong one).
      return { kind: "single", choice: (random() < 0.6 ? wrong[0] : pick(random, wrong)).id };
    }
    case "multiple": {
      const extra = question.options.filter((o) => !question.answers.includes(o.id));
      if (extra.length && random() < 0.5) return { kind: "multiple", choices: [...question.answers, pick(random, extra).id] };
      const dropped = pick(random, question.answers);
      return { kind: "multiple", choices: question.answers.filter((id) => id !== dropped) };
    }
    case "numeric":
      return wrongNumeric(question, seed, random);
    case "sim-task":
      // Submitted without changing anything: the grader checks whether the start already meets the task.
      return { kind: "sim-task", params: structuredClone(question.initial ?? {}) };
  }
}

function rightAnswer(question: QuestionDefinition, seed: number): QuizAnswer {
  return question.kind === "numeric" ? roundedRight(question, seed) : answerKey(question, seed);
}

/** Answers for one attempt: `wrong` questions wrong, `blank` left out, the rest right. */
export function demoAnswers(quiz: QuizDefinition, seed: number, random: RandomSource, wrong: number, blank = 0): Record<string, QuizAnswer> {
  const picked = chooseIndices(random, quiz.questions.length, wrong + blank);
  const wrongSet = new Set(picked.slice(0, wrong));
  const blankSet = new Set(picked.slice(wrong));
  const answers: Record<string, QuizAnswer> = {};
  quiz.questions.forEach((question, i) => {
    if (blankSet.has(i)) return;
    answers[question.id] = wrongSet.has(i) ? wrongAnswer(question, seed, random) : rightAnswer(question, seed);
  });
  return answers;
}
