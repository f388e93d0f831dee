/**
 * The gradebook of one cohort: students × quizzes of the assigned modules, with completion and
 * overdue marks; one student's attempts in detail; per-question analytics; progress over time.
 */
import type { AttemptResult } from "./quizzes";

export interface GradebookAssignment {
  id: number;
  moduleSlug: string;
  moduleTitle: string;
  dueAt: string;
  overdue: boolean;
}

export interface GradebookQuiz {
  id: string;
  title: string;
  lessonSlug: string;
  assignmentId: number;
  moduleTitle: string;
  maxScore: number;
  /** Share of the marks needed to pass (0..1). */
  passFraction: number;
}

export interface GradebookCell {
  attempts: number;
  /** Scores as shares of the maximum (0..1); null before the first attempt. */
  best: number | null;
  latest: number | null;
  passed: boolean;
  lastAttemptAt: string | null;
}

export interface GradebookCompletion {
  /** 0..1 */
  share: number;
  finished: boolean;
  /** Past the due date and not finished. */
  overdue: boolean;
}

export interface GradebookStudent {
  id: number;
  displayName: string;
  email: string;
  quizzes: Record<string, GradebookCell>;
  /** By assignment id. */
  assignments: Record<string, GradebookCompletion>;
  /** Mean completion over the cohort's assignments, 0..1. */
  completion: number;
  overdueCount: number;
}

/** GET /api/cohorts/:cohortId/gradebook */
export interface Gradebook {
  cohort: { id: number; name: string; archived: boolean };
  generatedAt: string;
  assignments: GradebookAssignment[];
  quizzes: GradebookQuiz[];
  students: GradebookStudent[];
}

/** GET /api/cohorts/:cohortId/students/:studentId/attempts */
export interface StudentAttempts {
  student: { id: number; displayName: string; email: string };
  cohort: { id: number; name: string };
  quizzes: { quizId: string; title: string; moduleTitle: string; attempts: AttemptResult[] }[];
}

export interface WrongAnswerCount {
  answer: string;
  count: number;
}

export interface QuestionAnalytics {
  questionId: string;
  /** The prompt as written (drawn numbers appear as {name}). */
  prompt: string;
  kind: string;
  /** Students whose latest attempt included this question. */
  answered: number;
  correct: number;
  /** correct / answered, or null when nobody answered. */
  correctShare: number | null;
  /** The most common wrong answers, most frequent first (at most 3). */
  commonWrong: WrongAnswerCount[];
}

export interface QuizAnalytics {
  quizId: string;
  title: string;
  /** Students with at least one attempt. */
  studentsAttempted: number;
  questions: QuestionAnalytics[];
}

export interface ProgressPoint {
  /** YYYY-MM-DD (UTC) */
  date: string;
  /** Mean completion of the assigned work at the end of that day, 0..1. */
  completion: number;
  /** Quiz attempts submitted that day. */
  attempts: number;
}

/** GET /api/cohorts/:cohortId/analytics */
export interface CohortAnalytics {
  cohort: { id: number; name: string };
  quizzes: QuizAnalytics[];
  progress: ProgressPoint[];
  dueDates: { date: string; moduleTitle: string }[];
}
