import { Router } from "express";
import { cohortStudentParamsSchema } from "../../shared/api/cohorts";
import type { AppContext } from "../context";
import { recordAudit } from "../services/audit";
import { buildGradebook, loadCohortWork, studentAttempts } from "../services/gradebook";
import { cohortAnalytics } from "../services/gradebook-analytics";
import { gradebookCsv, gradebookFileName } from "../services/gradebook-csv";
import { teachingOverview } from "../services/cohorts-assignments";
import { getCourseCatalog } from "../services/lessons/course";
import { currentUser, requireRole } from "../middleware/authorize";
import { actorOf, cohortGuards, ownedCohort } from "./cohorts";

/** /api/cohorts/:cohortId/gradebook(.csv), /analytics and one student's attempts. */
export function createGradebookRouter(ctx: AppContext): Router {
  const router = Router();

  // GET /api/cohorts/:cohortId/gradebook -> Gradebook
  router.get("/:cohortId/gradebook", ...cohortGuards(ctx), async (_req, res) => {
    const catalog = await getCourseCatalog();
    res.json(buildGradebook(catalog, await loadCohortWork(ctx.db, catalog, ownedCohort(res))));
  });

  // GET /api/cohorts/:cohortId/gradebook.csv -> text/csv attachment (formula cells defused); audited
  router.get("/:cohortId/gradebook.csv", ...cohortGuards(ctx), async (req, res) => {
    const catalog = await getCourseCatalog();
    const cohort = ownedCohort(res);
    const book = buildGradebook(catalog, await loadCohortWork(ctx.db, catalog, cohort));
    const csv = gradebookCsv(book);
    const actor = actorOf(req);
    await ctx.db.write((t) =>
      recordAudit(ctx.db, { actorId: actor.user.id, action: "grades.exported", targetType: "cohort", targetId: cohort.id, details: { students: book.students.length, quizzes: book.quizzes.length }, ip: actor.ip }, t),
    );
    res.setHeader("Content-Type", "text/csv; charset=utf-8");
    res.setHeader("Content-Disposition", `attachment; filename="${gradebookFileName(cohort.id)}"`);
    // The BOM lets spreadsheet programs read the file as UTF-8.
    res.send(`\uFEFF${csv}\r\n`);
  });

  // GET /api/cohorts/:cohortId/analytics -> CohortAnalytics
  router.get("/:cohortId/analytics", ...cohortGuards(ctx), async (_req, res) => {
    const catalog = await getCourseCatalog();
    res.json(await cohortAnalytics(ctx.db, catalog, await loadCohortWork(ctx.db, catalog, ownedCohort(res))));
  });

  // GET /api/cohorts/:cohortId/students/:studentId/attempts -> StudentAttempts (404 if not in this cohort)
  router.get("/:cohortId/students/:studentId/attempts", ...cohortGuards(ctx, cohortStudentParamsSchema), async (req, res) => {
    res.json(await studentAttempts(ctx.db, await getCourseCatalog(), ownedCohort(res), Number(req.params.studentId)));
  });

  return router;
}

/** /api/teaching/overview: the instructor dashboard (own cohorts; all for admins). */
export function createTeachingRouter(ctx: AppContext): Router {
  const router = Router();
  router.get("/overview", requireRole("instructor", "admin"), async (req, res) => {
    res.json(await teachingOverview(ctx.db, await getCourseCatalog(), currentUser(req)));
  });
  return router;
}
