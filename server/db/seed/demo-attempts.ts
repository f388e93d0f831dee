/**
 * Demo quiz attempts through the real quiz path: getQuizView draws the open attempt (as GET
 * /api/quizzes/:id), the student answers those questions, and submitAttempt validates the
 * attempt limit and draw, grades and stores it (as POST /api/quizzes/:id/attempts). Only the
 * submission time is moved back afterwards, to the day the story says.
 */
import { submitAttemptRequestSchema } from "../../../shared/api/quizzes";
import { getQuizView, submitAttempt } from "../../quiz/attempts";
import { attemptSeed } from "../../quiz/seed";
import { randomFor, type SeedContext } from "./demo-context";
import { demoAnswers } from "./demo-answers";
import type { StudentStory } from "./demo-history";

export async function seedQuizAttempts(s: SeedContext, stories: StudentStory[]): Promise<number> {
  let count = 0;
  for (const story of stories) {
    const userId = s.userId(`${story.local}@grain-edge.test`);
    // Oldest first, so draw numbers and submission times rise together.
    const plans = [...story.attempts].sort((a, b) => b.daysAgo - a.daysAgo);
    for (const plan of plans) {
      const quiz = s.catalog.quizzes.get(plan.quiz);
      if (!quiz) continue; // another course (test fixture)
      const view = await getQuizView(s.ctx, s.catalog, userId, quiz.id);
      const seed = attemptSeed(s.ctx.config.sessionSecret, userId, quiz.id, view.drawId);
      const random = randomFor(`${story.local}:${quiz.id}:${view.drawId}`);
      const request = submitAttemptRequestSchema.parse({
        idempotencyKey: `demo-${story.local.replace(/[^a-z0-9-]/g, "-")}-${quiz.id}-${view.drawId}`,
        drawId: view.drawId,
        answers: demoAnswers(quiz, seed, random, plan.wrong, plan.blank),
      });
      const { attempt } = await submitAttempt(s.ctx, s.catalog, userId, quiz.id, request);
      await s.db.models.QuizAttempt.update({ submittedAt: s.when(plan.daysAgo) }, { where: { id: attempt.id }, transaction: s.transaction });
      count += 1;
    }
  }
  return count;
}
