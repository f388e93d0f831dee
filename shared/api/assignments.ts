/**
 * Assignments: a module set for a cohort with a due date and an attempt limit per quiz; and
 * what a student sees of them on their home page.
 */
import { z } from "zod";
import { idParam } from "./cohorts";

export const assignmentParamsSchema = z.object({ cohortId: idParam("cohort"), assignmentId: idParam("assignment") });

const moduleSlugSchema = z
  .string()
  .min(1)
  .max(80)
  .regex(/^[a-z0-9][a-z0-9-]*$/, "Module slugs are lower-case letters, digits and hyphens.");

const dueAtSchema = z.iso.datetime({ offset: true, error: "Give the due date as an ISO 8601 date and time." });
export const MAX_ATTEMPTS_LIMIT = 20;
const maxAttemptsSchema = z
  .number({ error: "Attempts must be a whole number." })
  .int("Attempts must be a whole number.")
  .min(1, "Allow at least one attempt.")
  .max(MAX_ATTEMPTS_LIMIT, `Allow at most ${MAX_ATTEMPTS_LIMIT} attempts.`)
  .nullable();

export const createAssignmentRequestSchema = z.strictObject({
  moduleSlug: moduleSlugSchema,
  dueAt: dueAtSchema,
  /** null = unlimited attempts per quiz. */
  maxAttemptsPerQuiz: maxAttemptsSchema,
});
export type CreateAssignmentRequest = z.infer<typeof createAssignmentRequestSchema>;

export const updateAssignmentRequestSchema = z
  .strictObject({ dueAt: dueAtSchema.optional(), maxAttemptsPerQuiz: maxAttemptsSchema.optional() })
  .refine((v) => v.dueAt !== undefined || v.maxAttemptsPerQuiz !== undefined, "Send at least one change.");
export type UpdateAssignmentRequest = z.infer<typeof updateAssignmentRequestSchema>;

export interface ModuleRef {
  slug: string;
  title: string;
  lessonCount: number;
  quizCount: number;
}

export interface CohortAssignment {
  id: number;
  cohortId: number;
  module: ModuleRef;
  dueAt: string;
  maxAttemptsPerQuiz: number | null;
  overdue: boolean;
  /** Students who finished every lesson and passed every quiz of the module. */
  finishedCount: number;
  studentCount: number;
  createdAt: string;
}

/** GET /api/cohorts/:cohortId/assignments */
export interface CohortAssignmentsResponse {
  assignments: CohortAssignment[];
  /** Every module of the course, for the editor's menu. */
  modules: (ModuleRef & { assigned: boolean })[];
}

export interface AssignmentProgress {
  lessonsDone: number;
  lessonsTotal: number;
  quizzesPassed: number;
  quizzesTotal: number;
  /** (lessons done + quizzes passed) / (lessons + quizzes), 0..1. */
  share: number;
}

export type MyAssignmentState = "done" | "due" | "overdue";

export interface MyAssignment {
  id: number;
  cohort: { id: number; name: string };
  module: { slug: string; title: string };
  dueAt: string;
  maxAttemptsPerQuiz: number | null;
  state: MyAssignmentState;
  progress: AssignmentProgress;
  /** The first lesson not yet completed (or whose quiz is not passed), to continue from. */
  next: { lessonSlug: string; title: string } | null;
}

/** GET /api/assignments: the signed-in user's own assignments across their active cohorts. */
export interface MyAssignmentsResponse {
  assignments: MyAssignment[];
}
