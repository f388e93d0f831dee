/**
 * Lessons resource: the course outline with the signed-in learner's progress,
 * and per-lesson progress (opened, sections reached, checks answered, resume point).
 */
import { z } from "zod";

export const lessonSlugSchema = z
  .string()
  .min(1)
  .max(120)
  .regex(/^[a-z0-9][a-z0-9-]*$/, "Lesson slugs are lower-case letters, digits and hyphens.");

export const lessonParamsSchema = z.object({ slug: lessonSlugSchema });

const sectionIdSchema = z.string().min(1).max(120).regex(/^[A-Za-z][\w-]*$/);

export const checkAnswerSchema = z.object({
  /** Index of the option chosen. */
  choice: z.number().int().min(0).max(50),
  correct: z.boolean(),
});
export type CheckAnswer = z.infer<typeof checkAnswerSchema>;

/**
 * PUT /api/lessons/:slug/progress. Everything is merged into what is stored:
 * sections are added (never removed), checks are set per id, so two tabs cannot
 * erase each other's progress.
 */
export const lessonProgressUpdateSchema = z
  .object({
    sectionsReached: z.array(sectionIdSchema).max(100).optional(),
    lastSection: sectionIdSchema.nullable().optional(),
    checks: z.record(sectionIdSchema, checkAnswerSchema).optional(),
  })
  .strict();
export type LessonProgressUpdate = z.infer<typeof lessonProgressUpdateSchema>;

export interface LessonProgress {
  lessonSlug: string;
  /** ISO time the lesson was first opened; null if never. */
  openedAt: string | null;
  sectionsReached: string[];
  /** The section to resume at. */
  lastSection: string | null;
  checks: Record<string, CheckAnswer>;
  /** Set once every section has been reached. */
  completedAt: string | null;
}

export interface LessonSection {
  id: string;
  title: string;
}

export interface QuizSummary {
  attempts: number;
  bestScore: number | null;
  maxScore: number;
  passed: boolean;
}

export interface LessonOutline {
  slug: string;
  moduleSlug: string;
  title: string;
  summary: string;
  order: number;
  minutes: number;
  objectives: string[];
  sections: LessonSection[];
  quizId: string | null;
  progress: {
    openedAt: string | null;
    sectionsReached: number;
    lastSection: string | null;
    completedAt: string | null;
  };
  quiz: QuizSummary | null;
}

export interface ModuleOutline {
  slug: string;
  title: string;
  summary: string;
  /** 1-based position in the course. */
  order: number;
  lessons: LessonOutline[];
}

/** GET /api/modules */
export interface ModulesResponse {
  modules: ModuleOutline[];
}
