import { Router, type Request } from "express";
import {
  cohortListQuerySchema,
  cohortParamsSchema,
  cohortStudentParamsSchema,
  createCohortRequestSchema,
  moveStudentRequestSchema,
  updateCohortRequestSchema,
  type CohortListResponse,
  type CreateCohortRequest,
  type MoveStudentRequest,
  type UpdateCohortRequest,
} from "../../shared/api/cohorts";
import type { AppContext } from "../context";
import type { CohortInstance } from "../db/models";
import { currentUser, loadOwned, owned, requireRole } from "../middleware/authorize";
import { validate } from "../middleware/validate";
import { canManageCohort, cohortDetail, cohortLoader, createCohort, moveStudent, removeStudent, toListItems, updateCohort, visibleCohorts } from "../services/cohorts";

export const actorOf = (req: Request) => ({ user: currentUser(req), ip: req.ip });

/** Guards every /api/cohorts/:cohortId/... route: staff only (403), then own cohort or admin (else 404). */
export function cohortGuards(ctx: AppContext, extraParams = cohortParamsSchema) {
  return [
    requireRole("instructor", "admin"),
    validate({ params: extraParams }),
    loadOwned<CohortInstance>("cohort", cohortLoader(ctx.db), canManageCohort, "That cohort"),
  ];
}

export const ownedCohort = (res: Parameters<typeof owned>[0]) => owned<CohortInstance>(res, "cohort");

/**
 * /api/cohorts: list (own as instructor, all as admin), create, read, rename/archive, and the
 * roster of students (remove, move to another of the caller's cohorts).
 */
export function createCohortsRouter(ctx: AppContext): Router {
  const router = Router();
  const staff = requireRole("instructor", "admin");

  // GET /api/cohorts?archived=include|exclude|only -> CohortListResponse
  router.get("/", staff, validate({ query: cohortListQuerySchema }), async (req, res) => {
    const { archived } = req.query as unknown as { archived: "include" | "exclude" | "only" };
    const body: CohortListResponse = {
      cohorts: await ctx.db.read(async () => toListItems(ctx.db, await visibleCohorts(ctx.db, currentUser(req), archived))),
    };
    res.json(body);
  });

  // POST /api/cohorts {name, instructorId? (admins)} -> 201 { cohort }
  router.post("/", staff, validate({ body: createCohortRequestSchema }), async (req, res) => {
    const cohort = await createCohort(ctx.db, actorOf(req), req.body as CreateCohortRequest);
    const [item] = await ctx.db.read(() => toListItems(ctx.db, [cohort]));
    res.status(201).json({ cohort: item });
  });

  // GET /api/cohorts/:cohortId -> CohortDetail
  router.get("/:cohortId", ...cohortGuards(ctx), async (req, res) => {
    res.json(await cohortDetail(ctx.db, currentUser(req), ownedCohort(res)));
  });

  // PATCH /api/cohorts/:cohortId {name?, archived?, instructorId? (admins)} -> { cohort }
  router.patch("/:cohortId", ...cohortGuards(ctx), validate({ body: updateCohortRequestSchema }), async (req, res) => {
    const cohort = await updateCohort(ctx.db, actorOf(req), ownedCohort(res), req.body as UpdateCohortRequest);
    const [item] = await ctx.db.read(() => toListItems(ctx.db, [cohort]));
    res.json({ cohort: item });
  });

  // DELETE /api/cohorts/:cohortId/students/:studentId -> 204 (the account stays; only the enrolment goes)
  router.delete("/:cohortId/students/:studentId", ...cohortGuards(ctx, cohortStudentParamsSchema), async (req, res) => {
    await removeStudent(ctx.db, actorOf(req), ownedCohort(res), Number(req.params.studentId));
    res.status(204).end();
  });

  // POST /api/cohorts/:cohortId/students/:studentId/move {toCohortId} -> 204
  router.post(
    "/:cohortId/students/:studentId/move",
    ...cohortGuards(ctx, cohortStudentParamsSchema),
    validate({ body: moveStudentRequestSchema }),
    async (req, res) => {
      const { toCohortId } = req.body as MoveStudentRequest;
      await moveStudent(ctx.db, actorOf(req), ownedCohort(res), Number(req.params.studentId), toCohortId);
      res.status(204).end();
    },
  );

  return router;
}
