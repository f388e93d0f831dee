import { Router } from "express";
import {
  assignmentParamsSchema,
  createAssignmentRequestSchema,
  updateAssignmentRequestSchema,
  type CreateAssignmentRequest,
  type MyAssignmentsResponse,
  type UpdateAssignmentRequest,
} from "../../shared/api/assignments";
import type { AppContext } from "../context";
import { currentUser, requireAuth } from "../middleware/authorize";
import { validate } from "../middleware/validate";
import { cohortAssignments, createAssignment, deleteAssignment, myAssignments, updateAssignment } from "../services/cohorts-assignments";
import { getCourseCatalog } from "../services/lessons/course";
import { actorOf, cohortGuards, ownedCohort } from "./cohorts";

/** /api/cohorts/:cohortId/assignments: modules set for a cohort with due dates and attempt limits. */
export function createCohortAssignmentsRouter(ctx: AppContext): Router {
  const router = Router();

  // GET /api/cohorts/:cohortId/assignments -> CohortAssignmentsResponse
  router.get("/:cohortId/assignments", ...cohortGuards(ctx), async (_req, res) => {
    res.json(await cohortAssignments(ctx.db, await getCourseCatalog(), ownedCohort(res)));
  });

  // POST /api/cohorts/:cohortId/assignments {moduleSlug, dueAt, maxAttemptsPerQuiz} -> 201 { id }
  router.post("/:cohortId/assignments", ...cohortGuards(ctx), validate({ body: createAssignmentRequestSchema }), async (req, res) => {
    const row = await createAssignment(ctx.db, await getCourseCatalog(), actorOf(req), ownedCohort(res), req.body as CreateAssignmentRequest);
    res.status(201).json({ id: row.id });
  });

  // PATCH /api/cohorts/:cohortId/assignments/:assignmentId {dueAt?, maxAttemptsPerQuiz?} -> 204
  router.patch(
    "/:cohortId/assignments/:assignmentId",
    ...cohortGuards(ctx, assignmentParamsSchema),
    validate({ body: updateAssignmentRequestSchema }),
    async (req, res) => {
      await updateAssignment(ctx.db, actorOf(req), ownedCohort(res), Number(req.params.assignmentId), req.body as UpdateAssignmentRequest);
      res.status(204).end();
    },
  );

  // DELETE /api/cohorts/:cohortId/assignments/:assignmentId -> 204
  router.delete("/:cohortId/assignments/:assignmentId", ...cohortGuards(ctx, assignmentParamsSchema), async (req, res) => {
    await deleteAssignment(ctx.db, actorOf(req), ownedCohort(res), Number(req.params.assignmentId));
    res.status(204).end();
  });

  return router;
}

/** /api/assignments: the signed-in user's own assignments (what is due, what is overdue, progress). */
export function createMyAssignmentsRouter(ctx: AppContext): Router {
  const router = Router();

  // GET /api/assignments -> MyAssignmentsResponse (own only; empty outside cohorts)
  router.get("/", requireAuth, async (req, res) => {
    const body: MyAssignmentsResponse = { assignments: await myAssignments(ctx.db, await getCourseCatalog(), currentUser(req).id) };
    res.json(body);
  });

  return router;
}
