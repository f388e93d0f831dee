/**
 * Lesson progress: opened, sections reached, check questions answered, resume point.
 * Updates merge into the stored row inside one queued write, so two tabs (or a slow
 * request overtaken by a fast one) cannot erase each other's progress.
 */
import type { CheckAnswer, LessonProgress, LessonProgressUpdate, ModulesResponse, QuizSummary } from "../../../shared/api/lessons";
import type { AppContext } from "../../context";
import type { LessonProgressInstance } from "../../db/models";
import { HttpError, notFound } from "../../errors";
import { maxScore } from "../../quiz/present";
import type { CourseCatalog, LessonEntry } from "./catalog";

const iso = (value: Date | string | null | undefined) => (value ? new Date(value).toISOString() : null);

export function findLesson(catalog: CourseCatalog, slug: string): LessonEntry {
  const lesson = catalog.lessons.get(slug);
  if (!lesson) throw notFound("That lesson");
  return lesson;
}

function toProgress(slug: string, row: LessonProgressInstance | null): LessonProgress {
  return {
    lessonSlug: slug,
    openedAt: iso(row?.openedAt),
    sectionsReached: (row?.sectionsReached as string[] | undefined) ?? [],
    lastSection: row?.lastSection ?? null,
    checks: (row?.checksAnswered as Record<string, CheckAnswer> | undefined) ?? {},
    completedAt: iso(row?.completedAt),
  };
}

export async function getLessonProgress(ctx: AppContext, catalog: CourseCatalog, userId: number, slug: string): Promise<LessonProgress> {
  findLesson(catalog, slug);
  const row = await ctx.db.read(() => ctx.db.models.LessonProgress.findOne({ where: { userId, lessonSlug: slug } }));
  return toProgress(slug, row);
}

/** Reject ids the lesson does not have, naming the field, so stale clients get a clear 400. */
function assertKnownIds(lesson: LessonEntry, update: LessonProgressUpdate): void {
  const sections = new Set(lesson.sections.map((s) => s.id));
  const checks = new Set(lesson.checkIds);
  const fields: Record<string, string[]> = {};
  for (const id of update.sectionsReached ?? []) if (!sections.has(id)) (fields.sectionsReached ??= []).push(`This lesson has no section “${id}”.`);
  if (update.lastSection && !sections.has(update.lastSection)) fields.lastSection = [`This lesson has no section “${update.lastSection}”.`];
  for (const id of Object.keys(update.checks ?? {})) if (!checks.has(id)) (fields.checks ??= []).push(`This lesson has no check “${id}”.`);
  if (Object.keys(fields).length) throw new HttpError(400, "validation_failed", "Some fields are missing or invalid.", fields);
}

export async function updateLessonProgress(
  ctx: AppContext,
  catalog: CourseCatalog,
  userId: number,
  slug: string,
  update: LessonProgressUpdate,
): Promise<LessonProgress> {
  const lesson = findLesson(catalog, slug);
  assertKnownIds(lesson, update);
  const { LessonProgress: Progress } = ctx.db.models;
  const row = await ctx.db.write(async (transaction) => {
    const now = new Date();
    const existing = await Progress.findOne({ where: { userId, lessonSlug: slug }, transaction });
    const reached = new Set<string>([...((existing?.sectionsReached as string[] | undefined) ?? []), ...(update.sectionsReached ?? [])]);
    // Keep sections in lesson order, so the stored list reads like the table of contents.
    const sectionsReached = lesson.sections.map((s) => s.id).filter((id) => reached.has(id));
    const checksAnswered = { ...((existing?.checksAnswered as Record<string, CheckAnswer> | undefined) ?? {}), ...(update.checks ?? {}) };
    const lastSection = update.lastSection !== undefined ? update.lastSection : (existing?.lastSection ?? null);
    const allReached = lesson.sections.length > 0 && sectionsReached.length === lesson.sections.length;
    const completedAt = existing?.completedAt ?? (allReached ? now : null);
    if (!existing) {
      return Progress.create(
        { userId, lessonSlug: slug, openedAt: now, sectionsReached, checksAnswered, lastSection, completedAt },
        { transaction },
      );
    }
    existing.set({ sectionsReached, checksAnswered, lastSection, completedAt });
    // JSON columns: tell Sequelize they changed even when only nested content did.
    existing.changed("sectionsReached", true);
    existing.changed("checksAnswered", true);
    return existing.save({ transaction });
  });
  return toProgress(slug, row);
}

export async function getModules(ctx: AppContext, catalog: CourseCatalog, userId: number): Promise<ModulesResponse> {
  const { LessonProgress: Progress, QuizAttempt } = ctx.db.models;
  const [progressRows, attempts] = await ctx.db.read(() =>
    Promise.all([
      Progress.findAll({ where: { userId } }),
      QuizAttempt.findAll({ where: { userId }, attributes: ["quizId", "score", "maxScore"], raw: true }),
    ]),
  );
  const progressBySlug = new Map(progressRows.map((row) => [row.lessonSlug, row]));
  const quizSummary = (quizId: string | null): QuizSummary | null => {
    const quiz = quizId ? catalog.quizzes.get(quizId) : undefined;
    if (!quiz) return null;
    const mine = attempts.filter((a) => a.quizId === quizId);
    const best = mine.length ? Math.max(...mine.map((a) => Number(a.score))) : null;
    const total = maxScore(quiz);
    return { attempts: mine.length, bestScore: best, maxScore: total, passed: best !== null && best >= (quiz.passFraction ?? 0.7) * total - 1e-9 };
  };
  return {
    modules: catalog.modules.map((module) => ({
      slug: module.slug,
      title: module.title,
      summary: module.summary,
      order: module.order,
      lessons: module.lessons.map((lesson) => {
        const row = progressBySlug.get(lesson.slug) ?? null;
        return {
          slug: lesson.slug,
          moduleSlug: lesson.moduleSlug,
          title: lesson.title,
          summary: lesson.summary,
          order: lesson.order,
          minutes: lesson.minutes,
          objectives: lesson.objectives,
          sections: lesson.sections,
          quizId: lesson.quizId,
          progress: {
            openedAt: iso(row?.openedAt),
            sectionsReached: ((row?.sectionsReached as string[] | undefined) ?? []).length,
            lastSection: row?.lastSection ?? null,
            completedAt: iso(row?.completedAt),
          },
          quiz: quizSummary(lesson.quizId),
        };
      }),
    })),
  };
}
