/**
 * Writing forge-notebook entries and reviews: the steps behind POST/PUT /api/notebook/entries
 * and POST /api/notebook/entries/:id/review (server/routes/notebook.ts), also used by the demo
 * seed. Inputs are already validated by the shared zod schemas; access rules are those of
 * server/services/notebook.ts (anyone not allowed: 404). Each write goes through the write
 * queue; called inside another queued write (the seed's one transaction) it joins it.
 */
import { NOTEBOOK_LIMITS, type NotebookEntryInput, type ReviewRequest } from "../../shared/api/notebook";
import type { Db } from "../db/database";
import type { NotebookCommentInstance } from "../db/models/notebook-comment";
import type { NotebookEntryInstance } from "../db/models/notebook-entry";
import { HttpError, notFound } from "../errors";
import { isLive, type Actor } from "./actor";
import { recordAudit } from "./audit";
import { canReviewEntry, entryAttributes, resolveSteel } from "./notebook";

export const ENTRY = "That notebook entry";

type EntryRef = Pick<NotebookEntryInstance, "id" | "userId">;

/** A new entry in the actor's own notebook (at most NOTEBOOK_LIMITS.entriesPerUser). */
export async function createEntry(db: Db, actor: Actor, input: NotebookEntryInput): Promise<NotebookEntryInstance> {
  const userId = actor.user.id;
  const steel = await db.read(() => resolveSteel(db, userId, input.steel));
  return db.write(async (transaction) => {
    const count = await db.models.NotebookEntry.count({ where: { userId }, transaction });
    if (count >= NOTEBOOK_LIMITS.entriesPerUser) {
      throw new HttpError(409, "conflict", `A notebook holds at most ${NOTEBOOK_LIMITS.entriesPerUser} entries; delete an old one first.`);
    }
    return db.models.NotebookEntry.create({ userId, ...entryAttributes(input, steel) }, { transaction });
  });
}

/** Only the owner edits an entry. */
export async function updateEntry(db: Db, actor: Actor, entry: NotebookEntryInstance, input: NotebookEntryInput): Promise<void> {
  if (entry.userId !== actor.user.id) throw notFound(ENTRY);
  const steel = await db.read(() => resolveSteel(db, entry.userId, input.steel, entry));
  await db.write(async (transaction) => {
    const fresh = await db.models.NotebookEntry.findByPk(entry.id, { transaction });
    if (!fresh) throw notFound(ENTRY);
    // Changing an entry sent back for rework puts it in front of the instructor again.
    const review = fresh.reviewStatus === "needs-rework" ? { reviewStatus: "unreviewed" as const } : {};
    await fresh.update({ ...entryAttributes(input, steel), ...review }, { transaction });
  });
}

/**
 * An instructor's review: a comment with the verdict, the entry's review state, an audit row.
 * A live review leaves the comment's e-mail "pending" for the caller to send AFTER the commit
 * (server/services/notebook-mail.ts); the demo history's reviews e-mail nobody ("none").
 */
export async function reviewEntry(db: Db, actor: Actor, entry: EntryRef, input: ReviewRequest): Promise<NotebookCommentInstance> {
  const { status, comment } = input;
  const reviewerId = actor.user.id;
  const live = isLive(actor);
  if (!(await db.read(() => canReviewEntry(db, actor.user, entry)))) throw notFound(ENTRY);
  return db.write(async (transaction) => {
    const fresh = await db.models.NotebookEntry.findByPk(entry.id, { transaction });
    if (!fresh) throw notFound(ENTRY);
    const created = await db.models.NotebookComment.create(
      { entryId: entry.id, authorId: reviewerId, body: comment, status, notification: live ? "pending" : "none" },
      { transaction },
    );
    await fresh.update({ reviewStatus: status, reviewedAt: new Date(), reviewedById: reviewerId }, { transaction });
    if (live) {
      const details = { status, studentId: entry.userId };
      await recordAudit(db, { actorId: reviewerId, action: "notebook.review", targetType: "notebook-entry", targetId: entry.id, details, ip: actor.ip }, transaction);
    }
    return created;
  });
}
