/**
 * Cohorts: the classes an instructor teaches. Request/response shapes shared by the client hooks
 * (src/api/cohorts.ts) and the server routes (server/routes/cohorts.ts, teaching.ts).
 * Instructors see and change only their own cohorts; admins see all.
 */
import { z } from "zod";

/** Positive integer id from a path segment ("12"); anything else is a 400. */
export const idParam = (what: string) =>
  z.coerce.number({ error: `The ${what} id must be a number.` }).int().positive(`The ${what} id must be a positive integer.`);

export const cohortParamsSchema = z.object({ cohortId: idParam("cohort") });
export const cohortStudentParamsSchema = z.object({ cohortId: idParam("cohort"), studentId: idParam("student") });

// Control characters (CR, LF, NUL, bidi overrides…) have no place in names that reach e-mail headers and CSV files.
// eslint-disable-next-line no-control-regex
const CONTROL_CHARS = /[\u0000-\u001f\u007f-\u009f\u200e\u200f\u202a-\u202e\u2066-\u2069]/;

/** A one-line human text: trimmed, no control characters. */
export function plainTextSchema(label: string, min: number, max: number) {
  return z
    .string({ error: `${label} must be text.` })
    .trim()
    .min(min, min <= 1 ? `Enter ${label.toLowerCase()}.` : `${label} needs at least ${min} characters.`)
    .max(max, `${label} can have at most ${max} characters.`)
    .refine((v) => !CONTROL_CHARS.test(v), `${label} cannot contain line breaks or control characters.`);
}

export const cohortNameSchema = plainTextSchema("Cohort name", 2, 120);

export const createCohortRequestSchema = z.strictObject({
  name: cohortNameSchema,
  /** Admins only: who teaches it. Instructors always create cohorts they teach. */
  instructorId: z.number().int().positive().optional(),
});
export type CreateCohortRequest = z.infer<typeof createCohortRequestSchema>;

export const updateCohortRequestSchema = z
  .strictObject({
    name: cohortNameSchema.optional(),
    archived: z.boolean().optional(),
    /** Admins only: hand the cohort to another instructor. */
    instructorId: z.number().int().positive().optional(),
  })
  .refine((v) => v.name !== undefined || v.archived !== undefined || v.instructorId !== undefined, "Send at least one change.");
export type UpdateCohortRequest = z.infer<typeof updateCohortRequestSchema>;

export const moveStudentRequestSchema = z.strictObject({ toCohortId: z.number().int().positive() });
export type MoveStudentRequest = z.infer<typeof moveStudentRequestSchema>;

export const cohortListQuerySchema = z.object({
  archived: z.enum(["include", "exclude", "only"]).optional().default("include"),
});

export interface PersonRef {
  id: number;
  displayName: string;
}

export interface CohortListItem {
  id: number;
  name: string;
  instructor: PersonRef;
  archived: boolean;
  studentCount: number;
  assignmentCount: number;
  /** Invitations not yet accepted (pending or sent, not expired). */
  openInvitations: number;
  createdAt: string;
}

/** GET /api/cohorts */
export interface CohortListResponse {
  cohorts: CohortListItem[];
}

export interface CohortStudent {
  id: number;
  displayName: string;
  email: string;
  enrolledAt: string;
  disabled: boolean;
}

/** GET /api/cohorts/:cohortId */
export interface CohortDetail {
  cohort: CohortListItem;
  students: CohortStudent[];
  /** Other cohorts the caller may move a student into. */
  moveTargets: { id: number; name: string }[];
}

// ---------- Instructor dashboard (GET /api/teaching/overview) ----------

export interface BehindStudent {
  student: PersonRef;
  cohort: { id: number; name: string };
  /** Overdue assignments this student has not finished. */
  overdue: { assignmentId: number; moduleTitle: string; dueAt: string; completion: number }[];
}

export interface DueSoonAssignment {
  assignmentId: number;
  cohort: { id: number; name: string };
  moduleTitle: string;
  dueAt: string;
  finishedCount: number;
  studentCount: number;
}

export interface OverviewCohort extends CohortListItem {
  /** Students with at least one overdue, unfinished assignment. */
  behindCount: number;
  /** Next due date in the future, or null. */
  nextDueAt: string | null;
  /** Mean completion (0..1) of the assigned work over the cohort's students. */
  completion: number;
}

export interface TeachingOverview {
  cohorts: OverviewCohort[];
  behind: BehindStudent[];
  dueSoon: DueSoonAssignment[];
}
