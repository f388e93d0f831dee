import { Router } from "express";
import { lessonParamsSchema, lessonProgressUpdateSchema, type LessonProgressUpdate } from "../../shared/api/lessons";
import type { AppContext } from "../context";
import { currentUser, requireAuth } from "../middleware/authorize";
import { validate } from "../middleware/validate";
import { getCourseCatalog } from "../services/lessons/course";
import { getLessonProgress, getModules, updateLessonProgress } from "../services/lessons/progress";

/** GET /api/modules: the course outline in order, with the signed-in learner's progress. */
export function createModulesRouter(ctx: AppContext): Router {
  const router = Router();
  router.get("/", requireAuth, async (req, res) => {
    res.json(await getModules(ctx, await getCourseCatalog(), currentUser(req).id));
  });
  return router;
}

/** /api/lessons/:slug/progress: the learner's own progress in one lesson. */
export function createLessonsRouter(ctx: AppContext): Router {
  const router = Router();
  const params = validate({ params: lessonParamsSchema });

  router.get("/:slug/progress", requireAuth, params, async (req, res) => {
    res.json(await getLessonProgress(ctx, await getCourseCatalog(), currentUser(req).id, req.params.slug as string));
  });

  router.put("/:slug/progress", requireAuth, validate({ params: lessonParamsSchema, body: lessonProgressUpdateSchema }), async (req, res) => {
    const update = req.body as LessonProgressUpdate;
    res.json(await updateLessonProgress(ctx, await getCourseCatalog(), currentUser(req).id, req.params.slug as string, update));
  });

  return router;
}
