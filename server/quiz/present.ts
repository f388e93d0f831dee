/**
 * What a learner sees of a quiz: questions with drawn values substituted and every
 * answer key, explanation, feedback and function removed. Built field by field
 * (never by deleting from a copy) so a new secret field cannot leak by default.
 */
import type { PublicQuestion } from "../../shared/api/quizzes";
import type { QuestionDefinition, QuizDefinition } from "../../shared/quiz/definition";
import { drawParams, substitutePrompt } from "./draw";
import { questionPoints, unitMenu } from "./grade";

export function presentQuestion(question: QuestionDefinition, seed: number): PublicQuestion {
  const base = { id: question.id, points: questionPoints(question) };
  switch (question.kind) {
    case "single":
    case "multiple":
      return {
        ...base,
        kind: question.kind,
        prompt: question.prompt,
        options: question.options.map((option) => ({ id: option.id, text: option.text })),
      };
    case "numeric":
      return { ...base, kind: "numeric", prompt: substitutePrompt(question, drawParams(question, seed)), units: unitMenu(question) };
    case "sim-task":
      return {
        ...base,
        kind: "sim-task",
        prompt: question.prompt,
        simulation: question.simulation,
        initial: structuredClone(question.initial ?? {}),
      };
  }
}

export function presentQuiz(quiz: QuizDefinition, seed: number): PublicQuestion[] {
  return quiz.questions.map((question) => presentQuestion(question, seed));
}

export function maxScore(quiz: QuizDefinition): number {
  return quiz.questions.reduce((sum, q) => sum + questionPoints(q), 0);
}
