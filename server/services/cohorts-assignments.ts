/**
 * Assignments of a cohort (module + due date + attempts per quiz), the student's own list, and
 * the instructor dashboard overview (who is behind, what is due soon).
 */
import { Op } from "sequelize";
import type { PublicUser } from "../../shared/api/auth";
import type {
  CohortAssignment,
  CohortAssignmentsResponse,
  CreateAssignmentRequest,
  MyAssignment,
  UpdateAssignmentRequest,
} from "../../shared/api/assignments";
import type { BehindStudent, DueSoonAssignment, TeachingOverview } from "../../shared/api/cohorts";
import type { Db } from "../db/database";
import type { AssignmentInstance, CohortInstance } from "../db/models";
import { HttpError, notFound } from "../errors";
import { recordAudit } from "./audit";
import { assertActive, toListItems, visibleCohorts } from "./cohorts";
import { loadLearnerWork, moduleWork, nextLesson, progressOf, type ModuleWork } from "./gradebook-completion";
import type { CourseCatalog } from "./lessons/catalog";

const DUE_SOON_DAYS = 7;
const DAY_MS = 86_400_000;

interface Actor {
  user: PublicUser;
  ip: string | undefined;
}

function moduleRef(work: ModuleWork) {
  return { slug: work.slug, title: work.title, lessonCount: work.lessons.length, quizCount: work.quizIds.length };
}

export async function cohortAssignments(db: Db, catalog: CourseCatalog, cohort: CohortInstance, now = new Date()): Promise<CohortAssignmentsResponse> {
  return db.read(async () => {
    const { Assignment, Module, Enrollment } = db.models;
    const rows = await Assignment.findAll({ where: { cohortId: cohort.id }, include: [{ model: Module, as: "module" }], order: [["dueAt", "ASC"], ["id", "ASC"]] });
    const studentIds = (await Enrollment.findAll({ where: { cohortId: cohort.id }, attributes: ["studentId"], raw: true })).map((e) => e.studentId);
    const works = rows.map((row) => moduleWork(catalog, row.module?.slug ?? "", row.module?.title));
    const learners = await loadLearnerWork(db, catalog, studentIds, works.flatMap((w) => w.lessons.map((l) => l.slug)), works.flatMap((w) => w.quizIds));
    const assignments: CohortAssignment[] = rows.map((row, i) => ({
      id: row.id,
      cohortId: row.cohortId,
      module: moduleRef(works[i]),
      dueAt: new Date(row.dueAt).toISOString(),
      maxAttemptsPerQuiz: row.maxAttemptsPerQuiz,
      overdue: new Date(row.dueAt).getTime() < now.getTime(),
      finishedCount: studentIds.filter((id) => progressOf(works[i], learners.get(id)).finished).length,
      studentCount: studentIds.length,
      createdAt: new Date(row.createdAt).toISOString(),
    }));
    const assigned = new Set(works.map((w) => w.slug));
    return {
      assignments,
      modules: catalog.modules.map((m) => ({ ...moduleRef(moduleWork(catalog, m.slug)), assigned: assigned.has(m.slug) })),
    };
  });
}

export async function createAssignment(db: Db, catalog: CourseCatalog, actor: Actor, cohort: CohortInstance, request: CreateAssignmentRequest): Promise<AssignmentInstance> {
  assertActive(cohort);
  const entry = catalog.modules.find((m) => m.slug === request.moduleSlug);
  if (!entry) throw new HttpError(400, "validation_failed", "There is no such module.", { moduleSlug: ["Choose a module of the course."] });
  return db.write(async (transaction) => {
    const { Module, Assignment } = db.models;
    // Module rows mirror the course manifest; create the row the first time a module is assigned.
    const [module] = await Module.findOrCreate({ where: { slug: entry.slug }, defaults: { slug: entry.slug, title: entry.title, order: entry.order }, transaction });
    if (await Assignment.findOne({ where: { cohortId: cohort.id, moduleId: module.id }, transaction })) {
      throw new HttpError(409, "already_assigned", "This module is already assigned to the cohort; change its due date instead.");
    }
    const row = await Assignment.create(
      { cohortId: cohort.id, moduleId: module.id, dueAt: new Date(request.dueAt), maxAttemptsPerQuiz: request.maxAttemptsPerQuiz },
      { transaction },
    );
    await recordAudit(db, { actorId: actor.user.id, action: "assignment.created", targetType: "assignment", targetId: row.id, details: { cohortId: cohort.id, module: entry.slug, dueAt: request.dueAt, maxAttemptsPerQuiz: request.maxAttemptsPerQuiz }, ip: actor.ip }, transaction);
    return row;
  });
}

async function findAssignment(db: Db, cohortId: number, assignmentId: number) {
  const row = await db.models.Assignment.findOne({ where: { id: assignmentId, cohortId } });
  if (!row) throw notFound("That assignment");
  return row;
}

export async function updateAssignment(db: Db, actor: Actor, cohort: CohortInstance, assignmentId: number, request: UpdateAssignmentRequest): Promise<AssignmentInstance> {
  assertActive(cohort);
  return db.write(async (transaction) => {
    const row = await findAssignment(db, cohort.id, assignmentId);
    const details: Record<string, unknown> = {};
    if (request.dueAt !== undefined) {
      details.dueAt = { from: new Date(row.dueAt).toISOString(), to: request.dueAt };
      row.dueAt = new Date(request.dueAt);
      // A new due date deserves a new reminder.
      await db.models.ReminderLog.destroy({ where: { assignmentId: row.id, sentAt: null }, transaction });
    }
    if (request.maxAttemptsPerQuiz !== undefined) {
      details.maxAttemptsPerQuiz = { from: row.maxAttemptsPerQuiz, to: request.maxAttemptsPerQuiz };
      row.maxAttemptsPerQuiz = request.maxAttemptsPerQuiz;
    }
    await row.save({ transaction });
    await recordAudit(db, { actorId: actor.user.id, action: "assignment.updated", targetType: "assignment", targetId: row.id, details: { cohortId: cohort.id, ...details }, ip: actor.ip }, transaction);
    return row;
  });
}

export async function deleteAssignment(db: Db, actor: Actor, cohort: CohortInstance, assignmentId: number): Promise<void> {
  assertActive(cohort);
  await db.write(async (transaction) => {
    const row = await findAssignment(db, cohort.id, assignmentId);
    await row.destroy({ transaction });
    await recordAudit(db, { actorId: actor.user.id, action: "assignment.deleted", targetType: "assignment", targetId: assignmentId, details: { cohortId: cohort.id }, ip: actor.ip }, transaction);
  });
}

/** The signed-in user's assignments across their active cohorts (students; empty for others). */
export async function myAssignments(db: Db, catalog: CourseCatalog, userId: number, now = new Date()): Promise<MyAssignment[]> {
  return db.read(async () => {
    const { Enrollment, Cohort, Assignment, Module } = db.models;
    const enrollments = await Enrollment.findAll({
      where: { studentId: userId },
      include: [{ model: Cohort, as: "cohort", where: { archivedAt: null }, attributes: ["id", "name"] }],
    });
    if (enrollments.length === 0) return [];
    const cohortName = new Map(enrollments.map((e) => [e.cohortId, e.cohort!.name]));
    const rows = await Assignment.findAll({
      where: { cohortId: { [Op.in]: [...cohortName.keys()] } },
      include: [{ model: Module, as: "module" }],
      order: [["dueAt", "ASC"], ["id", "ASC"]],
    });
    const works = rows.map((row) => moduleWork(catalog, row.module?.slug ?? "", row.module?.title));
    const learner = (await loadLearnerWork(db, catalog, [userId], works.flatMap((w) => w.lessons.map((l) => l.slug)), works.flatMap((w) => w.quizIds))).get(userId);
    return rows.map((row, i) => {
      const progress = progressOf(works[i], learner);
      const dueAt = new Date(row.dueAt);
      return {
        id: row.id,
        cohort: { id: row.cohortId, name: cohortName.get(row.cohortId) ?? "" },
        module: { slug: works[i].slug, title: works[i].title },
        dueAt: dueAt.toISOString(),
        maxAttemptsPerQuiz: row.maxAttemptsPerQuiz,
        state: progress.finished ? "done" : dueAt.getTime() < now.getTime() ? "overdue" : "due",
        progress: { lessonsDone: progress.lessonsDone, lessonsTotal: progress.lessonsTotal, quizzesPassed: progress.quizzesPassed, quizzesTotal: progress.quizzesTotal, share: progress.share },
        next: nextLesson(works[i], learner),
      };
    });
  });
}

/**
 * The instructor dashboard: every visible cohort (archived ones last, without figures), who is
 * behind and what is due in the next week in the active ones.
 */
export async function teachingOverview(db: Db, catalog: CourseCatalog, user: PublicUser, now = new Date()): Promise<TeachingOverview> {
  return db.read(async () => {
    const all = await visibleCohorts(db, user, "include");
    const archivedItems = (await toListItems(db, all.filter((c) => c.archivedAt))).map((item) => ({ ...item, behindCount: 0, nextDueAt: null, completion: 0 }));
    const cohorts = all.filter((c) => !c.archivedAt);
    const items = await toListItems(db, cohorts);
    const { Enrollment, Assignment, Module, User } = db.models;
    const ids = cohorts.map((c) => c.id);
    const enrollments = ids.length
      ? await Enrollment.findAll({
          where: { cohortId: { [Op.in]: ids } },
          include: [{ model: User, as: "student", attributes: ["id", "displayName"], where: { disabledAt: null } }],
        })
      : [];
    const rows = ids.length ? await Assignment.findAll({ where: { cohortId: { [Op.in]: ids } }, include: [{ model: Module, as: "module" }], order: [["dueAt", "ASC"]] }) : [];
    const works = new Map(rows.map((r) => [r.id, moduleWork(catalog, r.module?.slug ?? "", r.module?.title)]));
    const allWorks = [...works.values()];
    const learners = await loadLearnerWork(
      db,
      catalog,
      [...new Set(enrollments.map((e) => e.studentId))],
      allWorks.flatMap((w) => w.lessons.map((l) => l.slug)),
      allWorks.flatMap((w) => w.quizIds),
    );

    const behind: BehindStudent[] = [];
    const dueSoon: DueSoonAssignment[] = [];
    const overview = items.map((item) => {
      const students = enrollments.filter((e) => e.cohortId === item.id);
      const mine = rows.filter((r) => r.cohortId === item.id);
      let shareSum = 0;
      let behindCount = 0;
      for (const e of students) {
        const overdue: BehindStudent["overdue"] = [];
        for (const row of mine) {
          const progress = progressOf(works.get(row.id)!, learners.get(e.studentId));
          shareSum += progress.share;
          if (!progress.finished && new Date(row.dueAt).getTime() < now.getTime()) {
            overdue.push({ assignmentId: row.id, moduleTitle: works.get(row.id)!.title, dueAt: new Date(row.dueAt).toISOString(), completion: progress.share });
          }
        }
        if (overdue.length) {
          behindCount += 1;
          behind.push({ student: { id: e.studentId, displayName: e.student!.displayName }, cohort: { id: item.id, name: item.name }, overdue });
        }
      }
      for (const row of mine) {
        const dueMs = new Date(row.dueAt).getTime();
        if (dueMs >= now.getTime() && dueMs <= now.getTime() + DUE_SOON_DAYS * DAY_MS) {
          dueSoon.push({
            assignmentId: row.id,
            cohort: { id: item.id, name: item.name },
            moduleTitle: works.get(row.id)!.title,
            dueAt: new Date(row.dueAt).toISOString(),
            finishedCount: students.filter((e) => progressOf(works.get(row.id)!, learners.get(e.studentId)).finished).length,
            studentCount: students.length,
          });
        }
      }
      const next = mine.map((r) => new Date(r.dueAt)).filter((d) => d.getTime() >= now.getTime())[0];
      return {
        ...item,
        behindCount,
        nextDueAt: next ? next.toISOString() : null,
        completion: students.length && mine.length ? shareSum / (students.length * mine.length) : 0,
      };
    });
    behind.sort((a, b) => b.overdue.length - a.overdue.length || a.student.displayName.localeCompare(b.student.displayName));
    dueSoon.sort((a, b) => a.dueAt.localeCompare(b.dueAt));
    return { cohorts: [...overview, ...archivedItems], behind, dueSoon };
  });
}
