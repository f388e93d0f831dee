import { z } from "zod";

/** GET /api/me/summary: a small, role-specific overview for each home page. */

export const studentCohortSummarySchema = z.object({
  id: z.number().int(),
  name: z.string(),
  instructorName: z.string(),
  studentCount: z.number().int(),
  assignmentCount: z.number().int(),
  overdueCount: z.number().int(),
  /** ISO 8601 due date of the next assignment that is not yet due, or null. */
  nextDueAt: z.string().nullable(),
});

export const instructorCohortSummarySchema = z.object({
  id: z.number().int(),
  name: z.string(),
  studentCount: z.number().int(),
  assignmentCount: z.number().int(),
  archived: z.boolean(),
});

export const meSummarySchema = z.discriminatedUnion("role", [
  z.object({
    role: z.literal("student"),
    cohorts: z.array(studentCohortSummarySchema),
    progress: z.object({ lessonsStarted: z.number().int(), lessonsCompleted: z.number().int() }),
    /** Self-learners only (null for school accounts): when their self-study pass ends (ISO), null if never paid. */
    selfStudy: z.object({ passValidUntil: z.string().nullable() }).nullable(),
  }),
  z.object({
    role: z.literal("instructor"),
    cohorts: z.array(instructorCohortSummarySchema),
  }),
  z.object({
    role: z.literal("admin"),
    counts: z.object({
      users: z.number().int(),
      students: z.number().int(),
      instructors: z.number().int(),
      admins: z.number().int(),
      disabledUsers: z.number().int(),
      cohorts: z.number().int(),
      activeCohorts: z.number().int(),
    }),
  }),
]);

export type StudentCohortSummary = z.infer<typeof studentCohortSummarySchema>;
export type InstructorCohortSummary = z.infer<typeof instructorCohortSummarySchema>;
export type MeSummary = z.infer<typeof meSummarySchema>;
export type StudentSummary = Extract<MeSummary, { role: "student" }>;
export type InstructorSummary = Extract<MeSummary, { role: "instructor" }>;
export type AdminSummary = Extract<MeSummary, { role: "admin" }>;
