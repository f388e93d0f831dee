/**
 * What "finished" means for an assignment, in one place (gradebook, dashboard, student home,
 * reminders): every lesson of the module completed AND every quiz of the module passed.
 * Completion share = (lessons completed + quizzes passed) / (lessons + quizzes).
 */
import { Op, type Transaction } from "sequelize";
import type { AssignmentProgress } from "../../shared/api/assignments";
import type { Db } from "../db/database";
import { passFraction } from "../quiz/grade";
import type { CourseCatalog } from "./lessons/catalog";

/** Float slack when comparing a score with the pass mark (the grader uses the same idea). */
const SLACK = 1e-9;

export interface ModuleWork {
  slug: string;
  title: string;
  order: number;
  lessons: { slug: string; title: string; quizId: string | null }[];
  quizIds: string[];
}

export function moduleWork(catalog: CourseCatalog, moduleSlug: string, fallbackTitle = moduleSlug): ModuleWork {
  const module = catalog.modules.find((m) => m.slug === moduleSlug);
  if (!module) return { slug: moduleSlug, title: fallbackTitle, order: 999, lessons: [], quizIds: [] };
  const lessons = module.lessons.map((l) => ({ slug: l.slug, title: l.title, quizId: l.quizId && catalog.quizzes.has(l.quizId) ? l.quizId : null }));
  return { slug: module.slug, title: module.title, order: module.order, lessons, quizIds: lessons.flatMap((l) => (l.quizId ? [l.quizId] : [])) };
}

export interface QuizRecord {
  attempts: number;
  /** Shares of the maximum, 0..1. */
  best: number;
  latest: number;
  latestAt: Date;
  /** When the first passing attempt was submitted, or null. */
  passedAt: Date | null;
}

export interface LearnerWork {
  /** Lesson slug -> when it was completed. */
  lessonsDone: Map<string, Date>;
  quizzes: Map<string, QuizRecord>;
}

const emptyWork = (): LearnerWork => ({ lessonsDone: new Map(), quizzes: new Map() });

/** Lesson completions and quiz records of these learners, for these lessons and quizzes (two queries). */
export async function loadLearnerWork(
  db: Db,
  catalog: CourseCatalog,
  userIds: number[],
  lessonSlugs: string[],
  quizIds: string[],
  transaction?: Transaction,
): Promise<Map<number, LearnerWork>> {
  const out = new Map<number, LearnerWork>(userIds.map((id) => [id, emptyWork()]));
  if (userIds.length === 0) return out;
  const [lessons, attempts] = await Promise.all([
    lessonSlugs.length
      ? db.models.LessonProgress.findAll({
          where: { userId: { [Op.in]: userIds }, lessonSlug: { [Op.in]: lessonSlugs }, completedAt: { [Op.ne]: null } },
          attributes: ["userId", "lessonSlug", "completedAt"],
          raw: true,
          transaction,
        })
      : [],
    quizIds.length
      ? db.models.QuizAttempt.findAll({
          where: { userId: { [Op.in]: userIds }, quizId: { [Op.in]: quizIds } },
          attributes: ["userId", "quizId", "score", "maxScore", "submittedAt", "id"],
          order: [["submittedAt", "ASC"], ["id", "ASC"]],
          raw: true,
          transaction,
        })
      : [],
  ]);
  for (const row of lessons) out.get(row.userId)?.lessonsDone.set(row.lessonSlug, new Date(row.completedAt as Date));
  for (const row of attempts) {
    const work = out.get(row.userId);
    const quiz = catalog.quizzes.get(row.quizId);
    if (!work) continue;
    const max = Number(row.maxScore);
    const share = max > 0 ? Number(row.score) / max : 0;
    const at = new Date(row.submittedAt);
    const passed = quiz ? max > 0 && Number(row.score) >= passFraction(quiz) * max - SLACK : false;
    const prev = work.quizzes.get(row.quizId);
    work.quizzes.set(row.quizId, {
      attempts: (prev?.attempts ?? 0) + 1,
      best: Math.max(prev?.best ?? 0, share),
      latest: share,
      latestAt: at,
      passedAt: prev?.passedAt ?? (passed ? at : null),
    });
  }
  return out;
}

export interface ModuleProgress extends AssignmentProgress {
  finished: boolean;
  /** When the last missing piece was done (for finished work), else null. */
  finishedAt: Date | null;
}

export function progressOf(work: ModuleWork, learner: LearnerWork | undefined, asOf?: Date): ModuleProgress {
  const l = learner ?? emptyWork();
  const by = (d: Date | null | undefined) => !!d && (!asOf || d.getTime() <= asOf.getTime());
  const lessonDates = work.lessons.map((lesson) => l.lessonsDone.get(lesson.slug)).filter((d): d is Date => by(d));
  const quizDates = work.quizIds.map((id) => l.quizzes.get(id)?.passedAt ?? null).filter((d): d is Date => by(d));
  const total = work.lessons.length + work.quizIds.length;
  const done = lessonDates.length + quizDates.length;
  const finished = total > 0 && done === total;
  const finishedAt = finished ? new Date(Math.max(...[...lessonDates, ...quizDates].map((d) => d.getTime()))) : null;
  return {
    lessonsDone: lessonDates.length,
    lessonsTotal: work.lessons.length,
    quizzesPassed: quizDates.length,
    quizzesTotal: work.quizIds.length,
    share: total === 0 ? 0 : done / total,
    finished,
    finishedAt,
  };
}

/** The first lesson still to do (not completed, or its quiz not passed). */
export function nextLesson(work: ModuleWork, learner: LearnerWork | undefined): { lessonSlug: string; title: string } | null {
  for (const lesson of work.lessons) {
    const lessonDone = learner?.lessonsDone.has(lesson.slug) ?? false;
    const quizDone = !lesson.quizId || !!learner?.quizzes.get(lesson.quizId)?.passedAt;
    if (!lessonDone || !quizDone) return { lessonSlug: lesson.slug, title: lesson.title };
  }
  return null;
}
