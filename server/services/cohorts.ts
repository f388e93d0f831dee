/**
 * Cohorts: who may see and change which (the object-level rule), listing with counts, and the
 * changes instructors make (create, rename, archive, remove or move a student).
 *
 * RULE: an instructor sees and changes only cohorts whose instructorId is theirs; an admin sees
 * and changes all. Anything else answers 404 (loadOwned), so other cohorts' ids are not confirmed.
 */
import type { Request } from "express";
import { Op, col, fn, type Transaction } from "sequelize";
import type { PublicUser } from "../../shared/api/auth";
import type { CohortDetail, CohortListItem, CreateCohortRequest, UpdateCohortRequest } from "../../shared/api/cohorts";
import type { Db } from "../db/database";
import type { CohortInstance } from "../db/models";
import { HttpError, forbidden, notFound } from "../errors";
import { recordAudit } from "./audit";

export function canManageCohort(user: PublicUser, cohort: Pick<CohortInstance, "instructorId">): boolean {
  return user.role === "admin" || (user.role === "instructor" && cohort.instructorId === user.id);
}

/** For loadOwned("cohort", ...): the cohort named by :cohortId. */
export function cohortLoader(db: Db) {
  return (req: Request) => db.read(() => db.models.Cohort.findByPk(Number(req.params.cohortId)));
}

/** Writes to an archived cohort (other than un-archiving it) are refused. */
export function assertActive(cohort: CohortInstance): void {
  if (cohort.archivedAt) throw new HttpError(409, "cohort_archived", "This cohort is archived. Restore it first to make changes.");
}

const iso = (d: Date | string) => new Date(d).toISOString();

async function countBy(db: Db, model: "Enrollment" | "Assignment" | "Invitation", ids: number[], extra: object = {}): Promise<Map<number, number>> {
  if (ids.length === 0) return new Map();
  const rows = (await (db.models[model] as typeof db.models.Enrollment).findAll({
    attributes: ["cohortId", [fn("COUNT", col("id")), "n"]],
    where: { cohortId: { [Op.in]: ids }, ...extra },
    group: ["cohortId"],
    raw: true,
  })) as unknown as { cohortId: number; n: number }[];
  return new Map(rows.map((r) => [r.cohortId, Number(r.n)]));
}

export async function toListItems(db: Db, cohorts: CohortInstance[]): Promise<CohortListItem[]> {
  const ids = cohorts.map((c) => c.id);
  const instructorIds = [...new Set(cohorts.map((c) => c.instructorId))];
  const [students, assignments, invitations, instructors] = await Promise.all([
    countBy(db, "Enrollment", ids),
    countBy(db, "Assignment", ids),
    countBy(db, "Invitation", ids, {
      status: { [Op.in]: ["pending", "sent"] },
      [Op.or]: [{ expiresAt: null }, { expiresAt: { [Op.gt]: new Date() } }],
    }),
    instructorIds.length
      ? db.models.User.findAll({ where: { id: { [Op.in]: instructorIds } }, attributes: ["id", "displayName"], raw: true })
      : [],
  ]);
  const nameOf = new Map(instructors.map((u) => [u.id, u.displayName]));
  return cohorts.map((c) => ({
    id: c.id,
    name: c.name,
    instructor: { id: c.instructorId, displayName: nameOf.get(c.instructorId) ?? "" },
    archived: c.archivedAt !== null,
    studentCount: students.get(c.id) ?? 0,
    assignmentCount: assignments.get(c.id) ?? 0,
    openInvitations: invitations.get(c.id) ?? 0,
    createdAt: iso(c.createdAt),
  }));
}

/** The cohorts this user may see: their own as instructor, all as admin, none otherwise. */
export function visibleCohorts(db: Db, user: PublicUser, archived: "include" | "exclude" | "only" = "include"): Promise<CohortInstance[]> {
  if (user.role !== "admin" && user.role !== "instructor") return Promise.resolve([]);
  const where: Record<string, unknown> = {};
  if (user.role === "instructor") where.instructorId = user.id;
  if (archived === "exclude") where.archivedAt = null;
  if (archived === "only") where.archivedAt = { [Op.ne]: null };
  return db.models.Cohort.findAll({ where, order: [["archivedAt", "ASC"], ["name", "ASC"], ["id", "ASC"]] });
}

export async function cohortDetail(db: Db, user: PublicUser, cohort: CohortInstance): Promise<CohortDetail> {
  return db.read(async () => {
    const { Enrollment, User } = db.models;
    const [item] = await toListItems(db, [cohort]);
    const enrollments = await Enrollment.findAll({
      where: { cohortId: cohort.id },
      include: [{ model: User, as: "student", attributes: ["id", "displayName", "email", "disabledAt"] }],
    });
    const students = enrollments
      .filter((e) => e.student)
      .map((e) => ({
        id: e.student!.id,
        displayName: e.student!.displayName,
        email: e.student!.email,
        enrolledAt: iso(e.createdAt),
        disabled: e.student!.disabledAt !== null,
      }))
      .sort((a, b) => a.displayName.localeCompare(b.displayName));
    const targets = (await visibleCohorts(db, user, "exclude")).filter((c) => c.id !== cohort.id);
    return { cohort: item, students, moveTargets: targets.map((c) => ({ id: c.id, name: c.name })) };
  });
}

interface Actor {
  user: PublicUser;
  ip: string | undefined;
}

async function assertInstructor(db: Db, instructorId: number, transaction: Transaction): Promise<void> {
  const instructor = await db.models.User.findByPk(instructorId, { transaction });
  if (!instructor || instructor.role !== "instructor" || instructor.disabledAt) {
    throw new HttpError(400, "validation_failed", "Choose an active instructor.", { instructorId: ["Choose an active instructor account."] });
  }
}

export async function createCohort(db: Db, actor: Actor, request: CreateCohortRequest): Promise<CohortInstance> {
  // Field-level rule: only admins choose the instructor.
  if (request.instructorId !== undefined && actor.user.role !== "admin") throw forbidden();
  if (actor.user.role === "admin" && request.instructorId === undefined) {
    throw new HttpError(400, "validation_failed", "Choose who teaches this cohort.", { instructorId: ["Choose an instructor."] });
  }
  const instructorId = request.instructorId ?? actor.user.id;
  return db.write(async (transaction) => {
    if (actor.user.role === "admin") await assertInstructor(db, instructorId, transaction);
    const cohort = await db.models.Cohort.create({ name: request.name, instructorId }, { transaction });
    await recordAudit(db, { actorId: actor.user.id, action: "cohort.created", targetType: "cohort", targetId: cohort.id, details: { name: cohort.name, instructorId }, ip: actor.ip }, transaction);
    return cohort;
  });
}

export async function updateCohort(db: Db, actor: Actor, cohort: CohortInstance, request: UpdateCohortRequest): Promise<CohortInstance> {
  if (request.instructorId !== undefined && actor.user.role !== "admin") throw forbidden();
  return db.write(async (transaction) => {
    const row = await db.models.Cohort.findByPk(cohort.id, { transaction });
    if (!row) throw notFound("That cohort");
    const details: Record<string, unknown> = {};
    if (request.name !== undefined && request.name !== row.name) {
      details.renamed = { from: row.name, to: request.name };
      row.name = request.name;
    }
    if (request.archived !== undefined && request.archived !== (row.archivedAt !== null)) {
      details.archived = request.archived;
      row.archivedAt = request.archived ? new Date() : null;
    }
    if (request.instructorId !== undefined && request.instructorId !== row.instructorId) {
      await assertInstructor(db, request.instructorId, transaction);
      details.instructor = { from: row.instructorId, to: request.instructorId };
      row.instructorId = request.instructorId;
    }
    if (Object.keys(details).length === 0) return row;
    await row.save({ transaction });
    await recordAudit(db, { actorId: actor.user.id, action: "cohort.updated", targetType: "cohort", targetId: row.id, details, ip: actor.ip }, transaction);
    return row;
  });
}

export async function removeStudent(db: Db, actor: Actor, cohort: CohortInstance, studentId: number): Promise<void> {
  await db.write(async (transaction) => {
    const removed = await db.models.Enrollment.destroy({ where: { cohortId: cohort.id, studentId }, transaction });
    if (removed === 0) throw notFound("That student");
    await recordAudit(db, { actorId: actor.user.id, action: "cohort.student_removed", targetType: "cohort", targetId: cohort.id, details: { studentId }, ip: actor.ip }, transaction);
  });
}

/** Move a student to another cohort the actor also manages (404 for one they do not). */
export async function moveStudent(db: Db, actor: Actor, from: CohortInstance, studentId: number, toCohortId: number): Promise<void> {
  await db.write(async (transaction) => {
    const { Cohort, Enrollment } = db.models;
    const target = await Cohort.findByPk(toCohortId, { transaction });
    if (!target || !canManageCohort(actor.user, target)) throw notFound("That cohort");
    if (target.id === from.id) throw new HttpError(400, "validation_failed", "Choose a different cohort.", { toCohortId: ["Choose a different cohort."] });
    assertActive(target);
    const enrollment = await Enrollment.findOne({ where: { cohortId: from.id, studentId }, transaction });
    if (!enrollment) throw notFound("That student");
    const already = await Enrollment.findOne({ where: { cohortId: target.id, studentId }, transaction });
    await enrollment.destroy({ transaction });
    if (!already) await Enrollment.create({ cohortId: target.id, studentId }, { transaction });
    await recordAudit(
      db,
      { actorId: actor.user.id, action: "cohort.student_moved", targetType: "user", targetId: studentId, details: { from: from.id, to: target.id }, ip: actor.ip },
      transaction,
    );
  });
}
