/**
 * The gradebook of one cohort: its students × the quizzes of its assigned modules (best and
 * latest score, attempts, passed), completion and overdue marks per assignment; and one
 * student's attempts in full.
 */
import type { Gradebook, GradebookCell, GradebookQuiz, GradebookStudent, StudentAttempts } from "../../shared/api/gradebook";
import type { Db } from "../db/database";
import type { AssignmentInstance, CohortInstance, UserInstance } from "../db/models";
import { notFound } from "../errors";
import { toAttemptResult } from "../quiz/attempts";
import { passFraction } from "../quiz/grade";
import { maxScore } from "../quiz/present";
import { loadLearnerWork, moduleWork, progressOf, type LearnerWork, type ModuleWork } from "./gradebook-completion";
import type { CourseCatalog } from "./lessons/catalog";

export interface CohortWork {
  cohort: CohortInstance;
  students: UserInstance[];
  assignments: { row: AssignmentInstance; work: ModuleWork }[];
  learners: Map<number, LearnerWork>;
}

/** Everything the gradebook, CSV export and analytics need, read in a handful of queries. */
export async function loadCohortWork(db: Db, catalog: CourseCatalog, cohort: CohortInstance): Promise<CohortWork> {
  return db.read(async () => {
    const { Enrollment, User, Assignment, Module } = db.models;
    const enrollments = await Enrollment.findAll({
      where: { cohortId: cohort.id },
      include: [{ model: User, as: "student", attributes: ["id", "displayName", "email", "disabledAt"] }],
    });
    const students = enrollments
      .map((e) => e.student)
      .filter((s): s is UserInstance => !!s)
      .sort((a, b) => a.displayName.localeCompare(b.displayName) || a.id - b.id);
    const rows = await Assignment.findAll({ where: { cohortId: cohort.id }, include: [{ model: Module, as: "module" }], order: [["dueAt", "ASC"], ["id", "ASC"]] });
    const assignments = rows.map((row) => ({ row, work: moduleWork(catalog, row.module?.slug ?? "", row.module?.title) }));
    const lessonSlugs = assignments.flatMap((a) => a.work.lessons.map((l) => l.slug));
    const quizIds = assignments.flatMap((a) => a.work.quizIds);
    const learners = await loadLearnerWork(db, catalog, students.map((s) => s.id), lessonSlugs, quizIds);
    return { cohort, students, assignments, learners };
  });
}

const emptyCell = (): GradebookCell => ({ attempts: 0, best: null, latest: null, passed: false, lastAttemptAt: null });

export function buildGradebook(catalog: CourseCatalog, data: CohortWork, now = new Date()): Gradebook {
  const quizzes: GradebookQuiz[] = data.assignments.flatMap(({ row, work }) =>
    work.lessons.flatMap((lesson) => {
      const quiz = lesson.quizId ? catalog.quizzes.get(lesson.quizId) : undefined;
      if (!quiz) return [];
      return [{ id: quiz.id, title: quiz.title, lessonSlug: lesson.slug, assignmentId: row.id, moduleTitle: work.title, maxScore: maxScore(quiz), passFraction: passFraction(quiz) }];
    }),
  );
  const students: GradebookStudent[] = data.students.map((student) => {
    const learner = data.learners.get(student.id);
    const cells: Record<string, GradebookCell> = {};
    for (const quiz of quizzes) {
      const record = learner?.quizzes.get(quiz.id);
      cells[quiz.id] = record
        ? { attempts: record.attempts, best: record.best, latest: record.latest, passed: record.passedAt !== null, lastAttemptAt: record.latestAt.toISOString() }
        : emptyCell();
    }
    const completions: GradebookStudent["assignments"] = {};
    let shareSum = 0;
    let overdueCount = 0;
    for (const { row, work } of data.assignments) {
      const progress = progressOf(work, learner);
      const overdue = !progress.finished && new Date(row.dueAt).getTime() < now.getTime();
      completions[String(row.id)] = { share: progress.share, finished: progress.finished, overdue };
      shareSum += progress.share;
      if (overdue) overdueCount += 1;
    }
    return {
      id: student.id,
      displayName: student.displayName,
      email: student.email,
      quizzes: cells,
      assignments: completions,
      completion: data.assignments.length ? shareSum / data.assignments.length : 0,
      overdueCount,
    };
  });
  return {
    cohort: { id: data.cohort.id, name: data.cohort.name, archived: data.cohort.archivedAt !== null },
    generatedAt: now.toISOString(),
    assignments: data.assignments.map(({ row, work }) => ({
      id: row.id,
      moduleSlug: work.slug,
      moduleTitle: work.title,
      dueAt: new Date(row.dueAt).toISOString(),
      overdue: new Date(row.dueAt).getTime() < now.getTime(),
    })),
    quizzes,
    students,
  };
}

/** One student's attempts at the cohort's quizzes, with their answers and the grading. 404 if not in the cohort. */
export async function studentAttempts(db: Db, catalog: CourseCatalog, cohort: CohortInstance, studentId: number): Promise<StudentAttempts> {
  return db.read(async () => {
    const { Enrollment, User, Assignment, Module, QuizAttempt } = db.models;
    const enrolled = await Enrollment.findOne({ where: { cohortId: cohort.id, studentId } });
    const student = enrolled ? await User.findByPk(studentId, { attributes: ["id", "displayName", "email"] }) : null;
    if (!student) throw notFound("That student");
    const assignments = await Assignment.findAll({ where: { cohortId: cohort.id }, include: [{ model: Module, as: "module" }], order: [["dueAt", "ASC"]] });
    const works = assignments.map((a) => moduleWork(catalog, a.module?.slug ?? "", a.module?.title));
    const quizIds = works.flatMap((w) => w.quizIds);
    const rows = quizIds.length
      ? await QuizAttempt.findAll({ where: { userId: studentId, quizId: quizIds }, order: [["submittedAt", "DESC"], ["id", "DESC"]] })
      : [];
    return {
      student: { id: student.id, displayName: student.displayName, email: student.email },
      cohort: { id: cohort.id, name: cohort.name },
      quizzes: works.flatMap((work) =>
        work.quizIds.map((quizId) => ({
          quizId,
          title: catalog.quizzes.get(quizId)?.title ?? quizId,
          moduleTitle: work.title,
          attempts: rows.filter((r) => r.quizId === quizId).map(toAttemptResult),
        })),
      ),
    };
  });
}
