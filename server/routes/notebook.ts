import { Router, type Request } from "express";
import { Op } from "sequelize";
import {
  entryParamsSchema,
  fileParamsSchema,
  notebookEntryInputSchema,
  reviewListQuerySchema,
  reviewRequestSchema,
  type NotebookEntryInput,
  type ReviewListItem,
  type ReviewListQuery,
  type ReviewRequest,
} from "../../shared/api/notebook";
import type { AppContext } from "../context";
import type { NotebookEntryInstance } from "../db/models/notebook-entry";
import type { NotebookFileInstance } from "../db/models/notebook-file";
import { notFound } from "../errors";
import { currentUser, loadOwned, owned, requireAuth, requireRole } from "../middleware/authorize";
import { validate } from "../middleware/validate";
import { recordAudit } from "../services/audit";
import type { Actor } from "../services/actor";
import { canReadEntry, canReviewEntry, entryResponse, summaryIncludes, toComment, toSummary } from "../services/notebook";
import { createEntry, ENTRY, reviewEntry, updateEntry } from "../services/notebook-entries";
import { createNotebookFiles } from "../services/notebook-files";
import { reviewNotifier } from "../services/notebook-mail";

const FILE = "That file";
const actorOf = (req: Request): Actor => ({ user: currentUser(req), ip: req.ip });

/**
 * /api/notebook: forge-notebook entries, their photos and PDFs, and instructors' reviews.
 * Access rules are in server/services/notebook.ts; denials of someone else's entry or file
 * answer 404. Entry and review writes are in server/services/notebook-entries.ts, upload handling
 * in server/services/notebook-files.ts and server/uploads/.
 */
export function createNotebookRouter(ctx: AppContext): Router {
  const router = Router();
  const { db } = ctx;
  const { NotebookEntry, NotebookFile, NotebookComment, Enrollment, Cohort } = db.models;
  const files = createNotebookFiles(ctx);
  const notifier = reviewNotifier(ctx);

  const entryParams = validate({ params: entryParamsSchema });
  const fileParams = validate({ params: fileParamsSchema });
  const loadEntry = (req: Request) => db.read(() => NotebookEntry.findByPk((req.params as unknown as { id: number }).id));
  const loadFile = (req: Request) => db.read(() => NotebookFile.findByPk((req.params as unknown as { fileId: number }).fileId));
  const readableEntry = loadOwned<NotebookEntryInstance>("entry", loadEntry, (user, entry) => canReadEntry(db, user, entry), ENTRY);
  const ownEntry = loadOwned<NotebookEntryInstance>("entry", loadEntry, (user, entry) => entry.userId === user.id, ENTRY);
  const reviewableEntry = loadOwned<NotebookEntryInstance>("entry", loadEntry, (user, entry) => canReviewEntry(db, user, entry), ENTRY);
  // A file's userId is its entry owner's, so the entry's read rule applies to it directly.
  const readableFile = loadOwned<NotebookFileInstance>("file", loadFile, (user, file) => canReadEntry(db, user, file), FILE);
  const ownFile = loadOwned<NotebookFileInstance>("file", loadFile, (user, file) => file.userId === user.id, FILE);

  async function respondWithEntry(res: import("express").Response, id: number, req: Request, status = 200) {
    const body = await db.read(() => entryResponse(db, id, currentUser(req)));
    if (!body) throw notFound(ENTRY);
    res.status(status).json(body);
  }

  // ---- entries ------------------------------------------------------------------------------

  router.get("/entries", requireAuth, async (req, res) => {
    const userId = currentUser(req).id;
    const rows = await db.read(() =>
      NotebookEntry.findAll({ where: { userId }, include: summaryIncludes(db), order: [["workedOn", "DESC"], ["id", "DESC"]] }),
    );
    res.json({ entries: rows.map(toSummary), storage: await files.usage(userId) });
  });

  router.post("/entries", requireAuth, validate({ body: notebookEntryInputSchema }), async (req, res) => {
    const row = await createEntry(db, actorOf(req), req.body as NotebookEntryInput);
    await respondWithEntry(res, row.id, req, 201);
  });

  router.get("/entries/:id", requireAuth, entryParams, readableEntry, async (req, res) => {
    await respondWithEntry(res, owned<NotebookEntryInstance>(res, "entry").id, req);
  });

  router.put("/entries/:id", requireAuth, entryParams, ownEntry, validate({ body: notebookEntryInputSchema }), async (req, res) => {
    const entry = owned<NotebookEntryInstance>(res, "entry");
    await updateEntry(db, actorOf(req), entry, req.body as NotebookEntryInput);
    await respondWithEntry(res, entry.id, req);
  });

  router.delete("/entries/:id", requireAuth, entryParams, ownEntry, async (req, res) => {
    const entry = owned<NotebookEntryInstance>(res, "entry");
    const stored = await db.write(async (transaction) => {
      const rows = await NotebookFile.findAll({ where: { entryId: entry.id }, attributes: ["storedName", "thumbName"], transaction });
      // Comments and file rows go with the entry (ON DELETE CASCADE).
      await NotebookEntry.destroy({ where: { id: entry.id }, transaction });
      await recordAudit(db, { actorId: currentUser(req).id, action: "notebook.entry.delete", targetType: "notebook-entry", targetId: entry.id, details: { files: rows.length }, ip: req.ip ?? null }, transaction);
      return rows;
    });
    await files.discard(stored);
    res.status(204).end();
  });

  // ---- files --------------------------------------------------------------------------------

  router.post("/entries/:id/files", requireAuth, entryParams, ownEntry, async (req, res) => {
    const entry = owned<NotebookEntryInstance>(res, "entry");
    const result = await files.upload(req, res, entry, currentUser(req).id);
    res.status(201).json(result);
  });

  router.get("/files/:fileId", requireAuth, fileParams, readableFile, async (_req, res) => {
    await files.send(res, owned<NotebookFileInstance>(res, "file"), "main");
  });

  router.get("/files/:fileId/thumb", requireAuth, fileParams, readableFile, async (_req, res) => {
    await files.send(res, owned<NotebookFileInstance>(res, "file"), "thumb");
  });

  router.delete("/files/:fileId", requireAuth, fileParams, ownFile, async (req, res) => {
    const file = owned<NotebookFileInstance>(res, "file");
    await files.remove(file, currentUser(req).id);
    res.json({ storage: await files.usage(file.userId) });
  });

  // ---- review -------------------------------------------------------------------------------

  router.post("/entries/:id/review", requireRole("instructor", "admin"), entryParams, reviewableEntry, validate({ body: reviewRequestSchema }), async (req, res) => {
    const entry = owned<NotebookEntryInstance>(res, "entry");
    const actor = actorOf(req);
    const reviewer = actor.user;
    const { id: commentId } = await reviewEntry(db, actor, entry, req.body as ReviewRequest);
    // After the commit: the e-mail goes out in the background (server/services/notebook-mail.ts).
    notifier.enqueue(commentId, `${req.protocol}://${req.host}`);
    const body = await db.read(() => entryResponse(db, entry.id, reviewer));
    if (!body) throw notFound(ENTRY);
    const row = await db.read(() => NotebookComment.findByPk(commentId, { include: [{ model: db.models.User, as: "author", attributes: ["displayName"] }] }));
    res.status(201).json({ entry: body.entry, comment: toComment(row!) });
  });

  router.get("/review", requireRole("instructor", "admin"), validate({ query: reviewListQuerySchema }), async (req, res) => {
    const { status } = req.query as unknown as ReviewListQuery;
    const user = currentUser(req);
    const where: Record<string | symbol, unknown> = status === "all" ? {} : { reviewStatus: status };
    // Which cohorts each student is in (for an instructor: only the cohorts they teach).
    const enrollments = await db.read(() =>
      Enrollment.findAll({
        include: [{ model: Cohort, as: "cohort", attributes: ["id", "name"], where: user.role === "admin" ? {} : { instructorId: user.id }, required: true }],
        attributes: ["studentId"],
      }),
    );
    const cohortsOf = new Map<number, string[]>();
    for (const e of enrollments) cohortsOf.set(e.studentId, [...(cohortsOf.get(e.studentId) ?? []), e.cohort!.name]);
    if (user.role !== "admin") where.userId = { [Op.in]: [...cohortsOf.keys()] };
    const rows = await db.read(() =>
      NotebookEntry.findAll({ where, include: summaryIncludes(db), order: [["updatedAt", "DESC"], ["id", "DESC"]], limit: 500 }),
    );
    const entries: ReviewListItem[] = rows.map((row) => ({ ...toSummary(row), cohorts: (cohortsOf.get(row.userId) ?? []).sort() }));
    res.json({ entries });
  });

  return router;
}
