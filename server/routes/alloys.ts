import { Router, type Request } from "express";
import { Op } from "sequelize";
import {
  alloyIdParamSchema,
  attachAlloyRequestSchema,
  createSavedAlloyRequestSchema,
  detachAlloyParamsSchema,
  MAX_SAVED_ALLOYS_PER_USER,
  renameSavedAlloyRequestSchema,
  type AlloyComposition,
  type AttachedAlloy,
  type CreateSavedAlloyRequest,
  type RenameSavedAlloyRequest,
  type SavedAlloy,
} from "../../shared/api/alloys";
import { lessonParamsSchema } from "../../shared/api/lessons";
import type { AppContext } from "../context";
import { HttpError, notFound } from "../errors";
import { currentUser, loadOwned, owned, requireAuth, requireRole } from "../middleware/authorize";
import { validate } from "../middleware/validate";
import { getCourseCatalog } from "../services/lessons/course";
import type { LessonAlloyInstance } from "../db/models/lesson-alloy";
import type { SavedAlloyInstance } from "../db/models/saved-alloy";

const iso = (d: Date | string) => new Date(d).toISOString();

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
 * 404, as if it did not exist.
 */
export function createAlloysRouter(ctx: AppContext): Router {
  const router = Router();
  const { SavedAlloy, LessonAlloy } = ctx.db.models;
  const idParams = validate({ params: alloyIdParamSchema });
  const ownAlloy = loadOwned<SavedAlloyInstance>(
    "alloy",
    (req: Request) => ctx.db.read(() => SavedAlloy.findByPk((req.params as unknown as { id: number }).id)),
    (user, alloy) => alloy.userId === user.id,
    "That saved alloy",
  );

  router.get("/", requireAuth, async (req, res) => {
    const rows = await ctx.db.read(() =>
      SavedAlloy.findAll({ where: { userId: currentUser(req).id }, order: [["updatedAt", "DESC"], ["id", "DESC"]] }),
    );
    res.json({ alloys: rows.map(toSavedAlloy) });
  });

  router.post("/", requireAuth, validate({ body: createSavedAlloyRequestSchema }), async (req, res) => {
    const { name, composition } = req.body as CreateSavedAlloyRequest;
    const userId = currentUser(req).id;
    const row = await ctx.db.write(async (transaction) => {
      const count = await SavedAlloy.count({ where: { userId }, transaction });
      if (count >= MAX_SAVED_ALLOYS_PER_USER) {
        throw new HttpError(409, "conflict", `You can keep at most ${MAX_SAVED_ALLOYS_PER_USER} saved alloys; delete one first.`);
      }
      return SavedAlloy.create({ userId, name, composition: dropZeros(composition) }, { transaction });
    });
    res.status(201).json({ alloy: toSavedAlloy(row) });
  });

  router.patch("/:id", requireAuth, idParams, ownAlloy, validate({ body: renameSavedAlloyRequestSchema }), async (req, res) => {
    const { name } = req.body as RenameSavedAlloyRequest;
    const alloy = owned<SavedAlloyInstance>(res, "alloy");
    const row = await ctx.db.write(async (transaction) => {
      const fresh = await SavedAlloy.findByPk(alloy.id, { transaction });
      if (!fresh) throw notFound("That saved alloy");
      return fresh.update({ name }, { transaction });
    });
    res.json({ alloy: toSavedAlloy(row) });
  });

  router.delete("/:id", requireAuth, idParams, ownAlloy, async (_req, res) => {
    const alloy = owned<SavedAlloyInstance>(res, "alloy");
    await ctx.db.write((transaction) => SavedAlloy.destroy({ where: { id: alloy.id }, transaction }));
    res.status(204).end();
  });

  router.post(
    "/:id/attach",
    requireRole("instructor", "admin"),
    idParams,
    ownAlloy,
    validate({ body: attachAlloyRequestSchema }),
    async (req, res) => {
      const { lessonSlug, note } = req.body as { lessonSlug: string; note: string };
      const alloy = owned<SavedAlloyInstance>(res, "alloy");
      const catalog = await getCourseCatalog();
      if (!catalog.lessons.has(lessonSlug)) throw notFound("That lesson");
      const attachedById = currentUser(req).id;
      const [row, created] = await ctx.db.write(async (transaction) => {
        const existing = await LessonAlloy.findOne({ where: { alloyId: alloy.id, lessonSlug }, transaction });
        if (existing) return [await existing.update({ note, attachedById }, { transaction }), false] as const;
        return [await LessonAlloy.create({ alloyId: alloy.id, lessonSlug, note, attachedById }, { transaction }), true] as const;
      });
      const full = await ctx.db.read(() => loadAttachment(ctx, row.id));
      res.status(created ? 201 : 200).json({ attachment: toAttachedAlloy(full!, attachedById) });
    },
  );

  // Detaching is the owner's call, like attaching; the alloy itself stays saved.
  router.delete(
    "/:id/attach/:slug",
    requireRole("instructor", "admin"),
    validate({ params: detachAlloyParamsSchema }),
    ownAlloy,
    async (req, res) => {
      const alloy = owned<SavedAlloyInstance>(res, "alloy");
      const lessonSlug = (req.params as unknown as { slug: string }).slug;
      const removed = await ctx.db.write((transaction) => LessonAlloy.destroy({ where: { alloyId: alloy.id, lessonSlug }, transaction }));
      if (removed === 0) throw notFound("That attachment");
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

/** Zero means "none of this element"; store only what the alloy contains. */
function dropZeros(composition: AlloyComposition): AlloyComposition {
  return Object.fromEntries(Object.entries(composition).filter(([, v]) => typeof v === "number" && v > 0)) as AlloyComposition;
}
