/**
 * Quiz attempts: the open attempt a learner sees, submission (idempotent, within the
 * attempt limit, serialised through the write queue) and the learner's history.
 */
import type {
  AttemptAllowance,
  AttemptHistory,
  AttemptResult,
  PublicQuestion,
  QuestionResult,
  QuizView,
  SubmitAttemptRequest,
} from "../../shared/api/quizzes";
import type { QuizDefinition } from "../../shared/quiz/definition";
import type { AppContext } from "../context";
import type { QuizAttemptInstance } from "../db/models";
import { HttpError, notFound } from "../errors";
import type { CourseCatalog } from "../services/lessons/catalog";
import { attemptLimit } from "./attempt-limit";
import { gradeQuiz, passFraction } from "./grade";
import { maxScore, presentQuiz } from "./present";
import { attemptSeed, isParameterised } from "./seed";

/** What is stored in QuizAttempt.graded. */
interface StoredGrading {
  passed: boolean;
  results: QuestionResult[];
  questions: PublicQuestion[];
  drawNumber: number;
}

export function findQuiz(catalog: CourseCatalog, quizId: string): { quiz: QuizDefinition; moduleSlug: string } {
  const quiz = catalog.quizzes.get(quizId);
  const lesson = quiz ? catalog.lessons.get(quiz.lessonSlug) : undefined;
  if (!quiz || !lesson) throw notFound("That quiz");
  return { quiz, moduleSlug: lesson.moduleSlug };
}

function allowance(used: number, limit: number | null): AttemptAllowance {
  return { used, limit, remaining: limit === null ? null : Math.max(0, limit - used) };
}

export function toAttemptResult(row: QuizAttemptInstance): AttemptResult {
  const graded = row.graded as StoredGrading;
  return {
    id: row.id,
    quizId: row.quizId,
    createdAt: new Date(row.submittedAt).toISOString(),
    score: row.score,
    maxScore: row.maxScore,
    passed: graded.passed,
    questions: graded.questions,
    results: graded.results,
  };
}

export async function getQuizView(ctx: AppContext, catalog: CourseCatalog, userId: number, quizId: string): Promise<QuizView> {
  const { quiz, moduleSlug } = findQuiz(catalog, quizId);
  const [used, limit] = await ctx.db.read(() =>
    Promise.all([ctx.db.models.QuizAttempt.count({ where: { userId, quizId } }), attemptLimit(ctx.db, userId, moduleSlug)]),
  );
  // The open attempt is the next one; its seed is derived, so showing it writes nothing.
  const drawId = used + 1;
  return {
    quiz: { id: quiz.id, title: quiz.title, lessonSlug: quiz.lessonSlug, passFraction: passFraction(quiz), maxScore: maxScore(quiz) },
    drawId,
    questions: presentQuiz(quiz, attemptSeed(ctx.config.sessionSecret, userId, quizId, drawId)),
    attempts: allowance(used, limit),
  };
}

export interface SubmitOutcome {
  attempt: AttemptResult;
  /** True when the idempotency key had been used before and the stored attempt is returned. */
  replayed: boolean;
}

export async function submitAttempt(
  ctx: AppContext,
  catalog: CourseCatalog,
  userId: number,
  quizId: string,
  request: SubmitAttemptRequest,
): Promise<SubmitOutcome> {
  const { QuizAttempt } = ctx.db.models;
  const { quiz, moduleSlug } = findQuiz(catalog, quizId);
  const parameterised = isParameterised(quiz.questions);

  // Grade before taking the write lock: a sim-task check may run the science core for a while.
  const seed = attemptSeed(ctx.config.sessionSecret, userId, quizId, request.drawId);
  const graded = gradeQuiz(quiz, request.answers, seed, { simSchemas: catalog.simSchemas });

  const outcome = await ctx.db.write(async (transaction) => {
    // 1. A retry of a stored submission returns it, whatever else has happened since.
    const previous = await QuizAttempt.findOne({ where: { userId, idempotencyKey: request.idempotencyKey }, transaction });
    if (previous) {
      if (previous.quizId !== quizId) {
        throw new HttpError(409, "idempotency_key_reused", "This submission key was already used for another quiz.");
      }
      return { row: previous, replayed: true };
    }
    // 2. Count and insert in ONE queued IMMEDIATE transaction, so racing submissions cannot pass the limit.
    const used = await QuizAttempt.count({ where: { userId, quizId }, transaction });
    const limit = await attemptLimit(ctx.db, userId, moduleSlug, transaction);
    if (limit !== null && used >= limit) {
      throw new HttpError(409, "attempt_limit_reached", `You have used all ${limit} attempts at this quiz.`);
    }
    // 3. Drawn numbers may not be reused once an attempt with them has been graded (its result shows the answers).
    if (parameterised && request.drawId !== used + 1) {
      throw new HttpError(409, "stale_attempt", "These questions were already answered in another attempt. Reload the quiz for new numbers.");
    }
    const stored: StoredGrading = {
      passed: graded.passed,
      results: graded.results,
      questions: presentQuiz(quiz, seed),
      drawNumber: request.drawId,
    };
    const row = await QuizAttempt.create(
      {
        userId,
        quizId,
        idempotencyKey: request.idempotencyKey,
        answers: request.answers,
        score: graded.score,
        maxScore: graded.maxScore,
        graded: stored,
        submittedAt: new Date(),
        seed,
      },
      { transaction },
    );
    return { row, replayed: false };
  });
  return { attempt: toAttemptResult(outcome.row), replayed: outcome.replayed };
}

export async function getAttemptHistory(ctx: AppContext, catalog: CourseCatalog, userId: number, quizId: string): Promise<AttemptHistory> {
  const { moduleSlug } = findQuiz(catalog, quizId);
  const [rows, limit] = await ctx.db.read(() =>
    Promise.all([
      ctx.db.models.QuizAttempt.findAll({ where: { userId, quizId }, order: [["submittedAt", "DESC"], ["id", "DESC"]] }),
      attemptLimit(ctx.db, userId, moduleSlug),
    ]),
  );
  return { quizId, attempts: rows.map(toAttemptResult), allowance: allowance(rows.length, limit) };
}
