/**
 * Cohort analytics: per question, the share of students whose latest attempt got it right and
 * the most common wrong answers; and the cohort's completion of the assigned work day by day.
 */
import { Op } from "sequelize";
import type { CohortAnalytics, ProgressPoint, QuestionAnalytics, QuizAnalytics, WrongAnswerCount } from "../../shared/api/gradebook";
import type { QuestionResult } from "../../shared/api/quizzes";
import type { Db } from "../db/database";
import { progressOf } from "./gradebook-completion";
import type { CohortWork } from "./gradebook";
import type { CourseCatalog } from "./lessons/catalog";

const DAY_MS = 86_400_000;
/** The chart covers at most this many days (the most recent ones). */
const MAX_DAYS = 120;

const dayKey = (d: Date) => d.toISOString().slice(0, 10);

const leadingNumber = (text: string): number | null => {
  const m = /^\s*(-?\d+(?:\.\d+)?(?:e-?\d+)?)/i.exec(text.replace(/\u2212/g, "-"));
  return m ? Number(m[1]) : null;
};
const unitPart = (text: string) => text.replace(/^\s*-?[\d.eE\u2212-]+\s*/, "").trim();

/**
 * What counts as "the same wrong answer". Choices: the option text given. Numbers: drawn values
 * differ per student, so group by the kind of mistake (unit mix-up, too high, too low, far off).
 * Simulation tasks: all misses are one group.
 */
export function wrongKey(result: QuestionResult): string {
  if (result.given === "—" || result.given === "" || result.feedback === "Not answered.") return "Not answered";
  if (result.kind === "single" || result.kind === "multiple") return result.given;
  if (result.kind === "sim-task") return "Settings that do not meet the task";
  if (result.feedback?.startsWith("Your number is right in")) return "Right number, wrong unit";
  const correctText = result.correctAnswer.replace(/\s*\(accepted[^)]*\)\s*$/, "");
  const given = leadingNumber(result.given);
  const correct = leadingNumber(correctText);
  if (given === null || correct === null || unitPart(result.given) !== unitPart(correctText)) return "Outside the accepted range";
  if (correct !== 0 && (given / correct > 2 || given / correct < 0.5)) return given > correct ? "Far too high (over twice the answer)" : "Far too low (under half the answer)";
  return given > correct ? "Too high (outside the accepted range)" : "Too low (outside the accepted range)";
}

export async function quizAnalytics(db: Db, catalog: CourseCatalog, data: CohortWork): Promise<QuizAnalytics[]> {
  const quizIds = data.assignments.flatMap((a) => a.work.quizIds);
  const userIds = data.students.map((s) => s.id);
  if (quizIds.length === 0 || userIds.length === 0) {
    return quizIds.map((quizId) => ({ quizId, title: catalog.quizzes.get(quizId)?.title ?? quizId, studentsAttempted: 0, questions: [] }));
  }
  const rows = await db.read(() =>
    db.models.QuizAttempt.findAll({
      where: { userId: { [Op.in]: userIds }, quizId: { [Op.in]: quizIds } },
      attributes: ["userId", "quizId", "graded", "submittedAt", "id"],
      order: [["submittedAt", "ASC"], ["id", "ASC"]],
    }),
  );
  // Latest attempt per (student, quiz): later rows overwrite earlier ones.
  const latest = new Map<string, QuestionResult[]>();
  for (const row of rows) latest.set(`${row.userId}:${row.quizId}`, ((row.graded as { results?: QuestionResult[] })?.results ?? []) as QuestionResult[]);

  return quizIds.map((quizId) => {
    const quiz = catalog.quizzes.get(quizId);
    const perStudent = userIds.map((id) => latest.get(`${id}:${quizId}`)).filter((r): r is QuestionResult[] => !!r);
    const questions: QuestionAnalytics[] = (quiz?.questions ?? []).map((question) => {
      const results = perStudent.map((list) => list.find((r) => r.questionId === question.id)).filter((r): r is QuestionResult => !!r);
      const correct = results.filter((r) => r.correct).length;
      const wrong = new Map<string, number>();
      for (const r of results) if (!r.correct) wrong.set(wrongKey(r), (wrong.get(wrongKey(r)) ?? 0) + 1);
      const commonWrong: WrongAnswerCount[] = [...wrong.entries()]
        .map(([answer, count]) => ({ answer, count }))
        .sort((a, b) => b.count - a.count || a.answer.localeCompare(b.answer))
        .slice(0, 3);
      return {
        questionId: question.id,
        prompt: question.prompt,
        kind: question.kind,
        answered: results.length,
        correct,
        correctShare: results.length ? correct / results.length : null,
        commonWrong,
      };
    });
    return { quizId, title: quiz?.title ?? quizId, studentsAttempted: perStudent.length, questions };
  });
}

/** Mean completion of the assigned work at the end of each UTC day, from the first assignment to today. */
export function progressOverTime(data: CohortWork, attemptDates: Date[], now = new Date()): ProgressPoint[] {
  if (data.assignments.length === 0 || data.students.length === 0) return [];
  const startMs = Math.min(...data.assignments.map((a) => new Date(a.row.createdAt).getTime()), data.cohort.createdAt ? new Date(data.cohort.createdAt).getTime() : Infinity);
  const today = Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate());
  let first = Date.UTC(new Date(startMs).getUTCFullYear(), new Date(startMs).getUTCMonth(), new Date(startMs).getUTCDate());
  // Work done before the assignment was set still counts; start early enough to show it.
  for (const learner of data.learners.values()) {
    for (const d of learner.lessonsDone.values()) first = Math.min(first, Date.UTC(d.getUTCFullYear(), d.getUTCMonth(), d.getUTCDate()));
    for (const q of learner.quizzes.values()) if (q.passedAt) first = Math.min(first, Date.UTC(q.passedAt.getUTCFullYear(), q.passedAt.getUTCMonth(), q.passedAt.getUTCDate()));
  }
  first = Math.max(first, today - (MAX_DAYS - 1) * DAY_MS);
  const attemptsPerDay = new Map<string, number>();
  for (const d of attemptDates) attemptsPerDay.set(dayKey(d), (attemptsPerDay.get(dayKey(d)) ?? 0) + 1);

  const points: ProgressPoint[] = [];
  for (let day = first; day <= today; day += DAY_MS) {
    const endOfDay = new Date(day + DAY_MS - 1);
    let sum = 0;
    for (const student of data.students) {
      const learner = data.learners.get(student.id);
      for (const { work } of data.assignments) sum += progressOf(work, learner, endOfDay).share;
    }
    const key = dayKey(new Date(day));
    points.push({ date: key, completion: sum / (data.students.length * data.assignments.length), attempts: attemptsPerDay.get(key) ?? 0 });
  }
  return points;
}

export async function cohortAnalytics(db: Db, catalog: CourseCatalog, data: CohortWork, now = new Date()): Promise<CohortAnalytics> {
  const quizIds = data.assignments.flatMap((a) => a.work.quizIds);
  const userIds = data.students.map((s) => s.id);
  const attemptRows =
    quizIds.length && userIds.length
      ? await db.read(() =>
          db.models.QuizAttempt.findAll({ where: { userId: { [Op.in]: userIds }, quizId: { [Op.in]: quizIds } }, attributes: ["submittedAt"], raw: true }),
        )
      : [];
  return {
    cohort: { id: data.cohort.id, name: data.cohort.name },
    quizzes: await quizAnalytics(db, catalog, data),
    progress: progressOverTime(data, attemptRows.map((r) => new Date(r.submittedAt)), now),
    dueDates: data.assignments.map(({ row, work }) => ({ date: dayKey(new Date(row.dueAt)), moduleTitle: work.title })),
  };
}
