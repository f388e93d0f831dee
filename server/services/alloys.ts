/**
 * Saved alloys and their attachment to lesson tasks: the writes behind /api/alloys
 * (server/routes/alloys.ts), also used by the demo seed. Inputs are already validated by the
 * shared zod schemas. Each write goes through the write queue; called inside another queued
 * write (the seed's one transaction) it joins that transaction.
 *
 * RULES: an alloy is its owner's alone (anyone else: 404, as if it did not exist); a user keeps
 * at most MAX_SAVED_ALLOYS_PER_USER; only instructors and admins attach, and only their own
 * alloys, to lessons of the course; one attachment per alloy and lesson (attaching again
 * replaces the note).
 */
import type { z } from "zod";
import {
  MAX_SAVED_ALLOYS_PER_USER,
  type AlloyComposition,
  type attachAlloyRequestSchema,
  type CreateSavedAlloyRequest,
  type RenameSavedAlloyRequest,
} from "../../shared/api/alloys";
import type { Db } from "../db/database";
import type { LessonAlloyInstance } from "../db/models/lesson-alloy";
import type { SavedAlloyInstance } from "../db/models/saved-alloy";
import { forbidden, HttpError, notFound } from "../errors";
import type { Actor } from "./actor";
import type { CourseCatalog } from "./lessons/catalog";

const ALLOY = "That saved alloy";

/** The attach body after validation (the note defaults to ""). */
export type AttachAlloyInput = z.output<typeof attachAlloyRequestSchema>;

type OwnedAlloy = Pick<SavedAlloyInstance, "id" | "userId">;

/** Zero means "none of this element"; store only what the alloy contains. */
export function dropZeros(composition: AlloyComposition): AlloyComposition {
  return Object.fromEntries(Object.entries(composition).filter(([, v]) => typeof v === "number" && v > 0)) as AlloyComposition;
}

/** The one access rule for a saved alloy: only its owner sees or changes it. */
export const ownsAlloy = (user: { id: number }, alloy: OwnedAlloy): boolean => alloy.userId === user.id;

function assertOwner(actor: Actor, alloy: OwnedAlloy): void {
  if (!ownsAlloy(actor.user, alloy)) throw notFound(ALLOY);
}

function assertCanAttach(actor: Actor, alloy: OwnedAlloy): void {
  if (actor.user.role !== "instructor" && actor.user.role !== "admin") throw forbidden();
  assertOwner(actor, alloy);
}

export async function saveAlloy(db: Db, actor: Actor, input: CreateSavedAlloyRequest): Promise<SavedAlloyInstance> {
  const userId = actor.user.id;
  return db.write(async (transaction) => {
    // Counted inside the write, so two saves at once cannot pass the limit together.
    const count = await db.models.SavedAlloy.count({ where: { userId }, transaction });
    if (count >= MAX_SAVED_ALLOYS_PER_USER) {
      throw new HttpError(409, "conflict", `You can keep at most ${MAX_SAVED_ALLOYS_PER_USER} saved alloys; delete one first.`);
    }
    return db.models.SavedAlloy.create({ userId, name: input.name, composition: dropZeros(input.composition) }, { transaction });
  });
}

export async function renameAlloy(db: Db, actor: Actor, alloy: OwnedAlloy, input: RenameSavedAlloyRequest): Promise<SavedAlloyInstance> {
  assertOwner(actor, alloy);
  return db.write(async (transaction) => {
    const fresh = await db.models.SavedAlloy.findByPk(alloy.id, { transaction });
    if (!fresh) throw notFound(ALLOY);
    return fresh.update({ name: input.name }, { transaction });
  });
}

/** Deleting an alloy removes its attachments too (ON DELETE CASCADE). */
export async function deleteAlloy(db: Db, actor: Actor, alloy: OwnedAlloy): Promise<void> {
  assertOwner(actor, alloy);
  await db.write((transaction) => db.models.SavedAlloy.destroy({ where: { id: alloy.id }, transaction }));
}

export async function attachAlloy(
  db: Db,
  catalog: CourseCatalog,
  actor: Actor,
  alloy: OwnedAlloy,
  input: AttachAlloyInput,
): Promise<{ attachment: LessonAlloyInstance; created: boolean }> {
  assertCanAttach(actor, alloy);
  const { lessonSlug, note } = input;
  if (!catalog.lessons.has(lessonSlug)) throw notFound("That lesson");
  const attachedById = actor.user.id;
  const { LessonAlloy } = db.models;
  return db.write(async (transaction) => {
    const existing = await LessonAlloy.findOne({ where: { alloyId: alloy.id, lessonSlug }, transaction });
    if (existing) return { attachment: await existing.update({ note, attachedById }, { transaction }), created: false };
    return { attachment: await LessonAlloy.create({ alloyId: alloy.id, lessonSlug, note, attachedById }, { transaction }), created: true };
  });
}

/** Detaching is the owner's call, like attaching; the alloy itself stays saved. */
export async function detachAlloy(db: Db, actor: Actor, alloy: OwnedAlloy, lessonSlug: string): Promise<void> {
  assertCanAttach(actor, alloy);
  const removed = await db.write((transaction) => db.models.LessonAlloy.destroy({ where: { alloyId: alloy.id, lessonSlug }, transaction }));
  if (removed === 0) throw notFound("That attachment");
}
