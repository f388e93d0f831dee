import { Router, type Request } from "express";
import { Op } from "sequelize";
import {
  alloyIdParamSchema,
  attachAlloyRequestSchema,
  createSavedAlloyRequestSchema,
  detachAlloyParamsSchema,
  renameSavedAlloyRequestSchema,
  type AlloyComposition,
  type AttachedAlloy,
  type CreateSavedAlloyRequest,
  type RenameSavedAlloyRequest,
  type SavedAlloy,
} from "../../shared/api/alloys";
import { lessonParamsSchema } from "../../shared/api/lessons";
import type { AppContext } from "../context";
import { currentUser, loadOwned, owned, requireAuth, requireRole } from "../middleware/authorize";
import { validate } from "../middleware/validate";
import type { Actor } from "../services/actor";
import { attachAlloy, deleteAlloy, detachAlloy, ownsAlloy, renameAlloy, saveAlloy, type AttachAlloyInput } from "../services/alloys";
import { getCourseCatalog } from "../services/lessons/course";
import type { LessonAlloyInstance } from "../db/models/lesson-alloy";
import type { SavedAlloyInstance } from "../db/models/saved-alloy";

const iso = (d: Date | string) => new Date(d).toISOString();
const actorOf = (req: Request): Actor => ({ user: currentUser(req), ip: req.ip });

function toSavedAlloy(row: SavedAlloyInstance): SavedAlloy {
  return { id: row.id, name: row.name, composition: row.composition as AlloyComposition, createdAt: iso(row.createdAt), updatedAt: iso(row.updatedAt) };
}

/** `yours`: the viewer owns the attached alloy, so the lesson page may offer to remove it. */
function toAttachedAlloy(row: LessonAlloyInstance, viewerId: number): AttachedAlloy {
  return {
    id: row.id,
    lessonSlug: row.lessonSlug,
    note: row.note,
    alloyId: row.alloyId,
    name: row.alloy?.name ?? "",
    composition: (row.alloy?.composition ?? {}) as AlloyComposition,
    attachedBy: row.attachedBy?.displayName ?? "",
    yours: row.alloy?.userId === viewerId,
    createdAt: iso(row.createdAt),
  };
}

/**
 * /api/alloys: the signed-in user's saved alloys (list, create, rename, delete), and an
 * instructor attaching one of their own alloys to a lesson task. Another user's alloy answers
 * 404, as if it did not exist. The writes and their rules are in server/services/alloys.ts.
 */
export function createAlloysRouter(ctx: AppContext): Router {
  const router = Router();
  const { SavedAlloy } = ctx.db.models;
  const idParams = validate({ params: alloyIdParamSchema });
  const ownAlloy = loadOwned<SavedAlloyInstance>(
    "alloy",
    (req: Request) => ctx.db.read(() => SavedAlloy.findByPk((req.params as unknown as { id: number }).id)),
    ownsAlloy,
    "That saved alloy",
  );

  router.get("/", requireAuth, async (req, res) => {
    const rows = await ctx.db.read(() =>
      SavedAlloy.findAll({ where: { userId: currentUser(req).id }, order: [["updatedAt", "DESC"], ["id", "DESC"]] }),
    );
    res.json({ alloys: rows.map(toSavedAlloy) });
  });

  router.post("/", requireAuth, validate({ body: createSavedAlloyRequestSchema }), async (req, res) => {
    const row = await saveAlloy(ctx.db, actorOf(req), req.body as CreateSavedAlloyRequest);
    res.status(201).json({ alloy: toSavedAlloy(row) });
  });

  router.patch("/:id", requireAuth, idParams, ownAlloy, validate({ body: renameSavedAlloyRequestSchema }), async (req, res) => {
    const row = await renameAlloy(ctx.db, actorOf(req), owned<SavedAlloyInstance>(res, "alloy"), req.body as RenameSavedAlloyRequest);
    res.json({ alloy: toSavedAlloy(row) });
  });

  router.delete("/:id", requireAuth, idParams, ownAlloy, async (req, res) => {
    await deleteAlloy(ctx.db, actorOf(req), owned<SavedAlloyInstance>(res, "alloy"));
    res.status(204).end();
  });

  router.post(
    "/:id/attach",
    requireRole("instructor", "admin"),
    idParams,
    ownAlloy,
    validate({ body: attachAlloyRequestSchema }),
    async (req, res) => {
      const actor = actorOf(req);
      const alloy = owned<SavedAlloyInstance>(res, "alloy");
      const { attachment, created } = await attachAlloy(ctx.db, await getCourseCatalog(), actor, alloy, req.body as AttachAlloyInput);
      const full = await ctx.db.read(() => loadAttachment(ctx, attachment.id));
      res.status(created ? 201 : 200).json({ attachment: toAttachedAlloy(full!, actor.user.id) });
    },
  );

  router.delete(
    "/:id/attach/:slug",
    requireRole("instructor", "admin"),
    validate({ params: detachAlloyParamsSchema }),
    ownAlloy,
    async (req, res) => {
      const lessonSlug = (req.params as unknown as { slug: string }).slug;
      await detachAlloy(ctx.db, actorOf(req), owned<SavedAlloyInstance>(res, "alloy"), lessonSlug);
      res.status(204).end();
    },
  );

  return router;
}

/** /api/lessons/:slug/attached-alloys: alloys instructors attached to a lesson, for any signed-in reader. */
export function createLessonAlloysRouter(ctx: AppContext): Router {
  const router = Router();
  router.get("/:slug/attached-alloys", requireAuth, validate({ params: lessonParamsSchema }), async (req, res) => {
    const slug = (req.params as { slug: string }).slug;
    const viewerId = currentUser(req).id;
    const rows = await ctx.db.read(() =>
      ctx.db.models.LessonAlloy.findAll({
        where: { lessonSlug: slug },
        include: attachmentIncludes(ctx),
        order: [["createdAt", "ASC"], ["id", "ASC"]],
      }),
    );
    res.json({ attachments: rows.map((row) => toAttachedAlloy(row, viewerId)) });
  });
  return router;
}

function attachmentIncludes(ctx: AppContext) {
  return [
    { model: ctx.db.models.SavedAlloy, as: "alloy", attributes: ["name", "composition", "userId"] },
    { model: ctx.db.models.User, as: "attachedBy", attributes: ["displayName"] },
  ];
}

function loadAttachment(ctx: AppContext, id: number) {
  return ctx.db.models.LessonAlloy.findOne({ where: { id: { [Op.eq]: id } }, include: attachmentIncludes(ctx) });
}
