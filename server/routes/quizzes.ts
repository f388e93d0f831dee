import { Router } from "express";
import { quizParamsSchema, submitAttemptRequestSchema, type SubmitAttemptRequest } from "../../shared/api/quizzes";
import type { AppContext } from "../context";
import { currentUser, requireAuth } from "../middleware/authorize";
import { validate } from "../middleware/validate";
import { getAttemptHistory, getQuizView, submitAttempt } from "../quiz/attempts";
import { getCourseCatalog } from "../services/lessons/course";

/**
 * Quizzes, graded on the server. Questions go out without answer keys; answers come back
 * with an idempotency key; results and explanations are returned only after grading.
 */
export function createQuizzesRouter(ctx: AppContext): Router {
  const router = Router();
  const params = validate({ params: quizParamsSchema });

  // GET /api/quizzes/:id -> QuizView (questions of the open attempt, no answers).
  router.get("/:id", requireAuth, params, async (req, res) => {
    res.json(await getQuizView(ctx, await getCourseCatalog(), currentUser(req).id, req.params.id as string));
  });

  // POST /api/quizzes/:id/attempts -> 201 AttemptResult (200 with the stored attempt for a retried key).
  router.post("/:id/attempts", requireAuth, validate({ params: quizParamsSchema, body: submitAttemptRequestSchema }), async (req, res) => {
    const body = req.body as SubmitAttemptRequest;
    const outcome = await submitAttempt(ctx, await getCourseCatalog(), currentUser(req).id, req.params.id as string, body);
    res.status(outcome.replayed ? 200 : 201).json(outcome.attempt);
  });

  // GET /api/quizzes/:id/attempts -> AttemptHistory (own attempts only, newest first).
  router.get("/:id/attempts", requireAuth, params, async (req, res) => {
    res.json(await getAttemptHistory(ctx, await getCourseCatalog(), currentUser(req).id, req.params.id as string));
  });

  return router;
}
