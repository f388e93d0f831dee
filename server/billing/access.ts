import type { RequestHandler } from "express";
import type { Db } from "../db/database";
import { HttpError } from "../errors";
import { hasValidPass } from "./passes";

/**
 * Lesson progress and quizzes need a valid self-study pass for "self" accounts; school accounts
 * (demo seed, admin, invitations) are unaffected, and the lab stays open to everyone.
 * Signed-out requests pass through, so the route's own requireAuth still answers 401.
 */
export function requireStudyPass(db: Db): RequestHandler {
  return async (req, _res, next) => {
    if (!req.user) return next();
    const user = await db.read(() => db.models.User.findByPk(req.user!.id, { attributes: ["id", "kind"] }));
    if (user?.kind === "self" && !(await hasValidPass(db, user.id))) {
      throw new HttpError(402, "pass_required", "Your self-study pass is not active. Lessons' progress and quizzes need a valid pass; the simulation lab stays open.");
    }
    next();
  };
}
