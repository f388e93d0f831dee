/**
 * The gradebook: students × quizzes with best and latest score, completion and overdue marks;
 * a student's attempts with their answers and what was wrong; per-question analytics; progress
 * over time; the CSV export (audited).
 */
import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { CohortAnalytics, Gradebook, StudentAttempts } from "../../shared/api/gradebook";
import { wrongKey } from "../../server/services/gradebook-analytics";
import { createTeachingWorld, FAILING_ANSWERS, PASSING_ANSWERS, submitQuiz, type TeachingWorld } from "./teaching-fixture";

let w: TeachingWorld;
beforeAll(async () => {
  w = await createTeachingWorld();
  // s1: fails, then passes fixture-quiz. s2: fails it once. Neither touches quiz two.
  await submitQuiz(w.s1, "fixture-quiz", FAILING_ANSWERS);
  await submitQuiz(w.s1, "fixture-quiz", PASSING_ANSWERS);
  await submitQuiz(w.s2, "fixture-quiz", FAILING_ANSWERS);
  // s3 is in the other cohort: their attempt must not show up here.
  await submitQuiz(w.s3, "fixture-quiz", PASSING_ANSWERS);
});
afterAll(() => w?.t.cleanup());

describe("GET /api/cohorts/:id/gradebook", () => {
  it("has one column per quiz of the assigned modules and one row per student, with best and latest scores", async () => {
    const book = (await w.own.agent.get(`/api/cohorts/${w.cohortA}/gradebook`).expect(200)).body as Gradebook;
    expect(book.quizzes.map((q) => q.id)).toEqual(["fixture-quiz", "fixture-quiz-2"]);
    expect(book.quizzes[0]).toMatchObject({ maxScore: 6, passFraction: 0.5, assignmentId: w.assignmentA });
    expect(book.students.map((s) => s.id).sort()).toEqual([w.s1.user.id, w.s2.user.id].sort());
    const s1 = book.students.find((s) => s.id === w.s1.user.id)!;
    const s2 = book.students.find((s) => s.id === w.s2.user.id)!;
    // Fixture quiz: 6 marks; the failing answers earn 1 (only the fixed 727 °C), the passing ones 3.
    expect(s1.quizzes["fixture-quiz"]).toMatchObject({ attempts: 2, best: 0.5, latest: 0.5, passed: true });
    expect(s2.quizzes["fixture-quiz"]).toMatchObject({ attempts: 1, passed: false });
    expect(s2.quizzes["fixture-quiz"].best).toBeCloseTo(1 / 6, 10);
    expect(s1.quizzes["fixture-quiz-2"]).toEqual({ attempts: 0, best: null, latest: null, passed: false, lastAttemptAt: null });
    // Completion: 1 of 4 items (2 lessons + 2 quizzes) for s1, none for s2; not overdue yet.
    expect(s1.assignments[String(w.assignmentA)]).toEqual({ share: 0.25, finished: false, overdue: false });
    expect(s1.completion).toBe(0.25);
    expect(s2.overdueCount).toBe(0);
  });

  it("marks unfinished work past its due date as overdue", async () => {
    await w.t.db.write((tx) => w.t.db.models.Assignment.update({ dueAt: new Date(Date.now() - 60_000) }, { where: { id: w.assignmentA }, transaction: tx }));
    try {
      const book = (await w.own.agent.get(`/api/cohorts/${w.cohortA}/gradebook`).expect(200)).body as Gradebook;
      expect(book.assignments[0].overdue).toBe(true);
      for (const s of book.students) {
        expect(s.assignments[String(w.assignmentA)].overdue).toBe(true);
        expect(s.overdueCount).toBe(1);
      }
    } finally {
      await w.t.db.write((tx) => w.t.db.models.Assignment.update({ dueAt: new Date(Date.now() + 2 * 86_400_000) }, { where: { id: w.assignmentA }, transaction: tx }));
    }
  });

  it("is the same for an admin, and 404 for the other instructor", async () => {
    const mine = (await w.own.agent.get(`/api/cohorts/${w.cohortA}/gradebook`)).body as Gradebook;
    const admins = (await w.admin.agent.get(`/api/cohorts/${w.cohortA}/gradebook`).expect(200)).body as Gradebook;
    expect({ ...admins, generatedAt: "" }).toEqual({ ...mine, generatedAt: "" });
    await w.other.agent.get(`/api/cohorts/${w.cohortA}/gradebook`).expect(404);
  });
});

describe("drilling into one student's attempts", () => {
  it("shows each attempt with the answers given, the right answers and the feedback", async () => {
    const body = (await w.own.agent.get(`/api/cohorts/${w.cohortA}/students/${w.s1.user.id}/attempts`).expect(200)).body as StudentAttempts;
    expect(body.student.id).toBe(w.s1.user.id);
    const quiz = body.quizzes.find((q) => q.quizId === "fixture-quiz")!;
    expect(quiz.attempts).toHaveLength(2);
    const [latest, first] = quiz.attempts; // newest first
    expect(latest.passed).toBe(true);
    const single = first.results.find((r) => r.questionId === "q-single")!;
    expect(single).toMatchObject({ correct: false, given: "Ferrite", correctAnswer: "Austenite", feedback: "Ferrite is body-centred cubic." });
  });

  it("answers 404 for a student who is not in this cohort", async () => {
    await w.own.agent.get(`/api/cohorts/${w.cohortA}/students/${w.s3.user.id}/attempts`).expect(404);
    await w.own.agent.get(`/api/cohorts/${w.cohortA}/students/999999/attempts`).expect(404);
  });
});

describe("GET /api/cohorts/:id/analytics", () => {
  it("gives the share correct per question (latest attempts) and the most common wrong answers", async () => {
    const body = (await w.own.agent.get(`/api/cohorts/${w.cohortA}/analytics`).expect(200)).body as CohortAnalytics;
    const quiz = body.quizzes.find((q) => q.quizId === "fixture-quiz")!;
    expect(quiz.studentsAttempted).toBe(2); // s3's attempt (other cohort) is not counted
    const single = quiz.questions.find((q) => q.questionId === "q-single")!;
    // Latest attempts: s1 right (austenite), s2 wrong (ferrite).
    expect(single).toMatchObject({ answered: 2, correct: 1, correctShare: 0.5, commonWrong: [{ answer: "Ferrite", count: 1 }] });
    const eutectoid = quiz.questions.find((q) => q.questionId === "q-eutectoid")!;
    expect(eutectoid).toMatchObject({ answered: 2, correct: 2, correctShare: 1, commonWrong: [] });
    const unanswered = quiz.questions.find((q) => q.questionId === "q-sim")!;
    expect(unanswered.correct).toBe(0);
  });

  it("has a daily progress series ending today, rising with the work done", async () => {
    const body = (await w.own.agent.get(`/api/cohorts/${w.cohortA}/analytics`).expect(200)).body as CohortAnalytics;
    const today = new Date().toISOString().slice(0, 10);
    expect(body.progress.at(-1)!.date).toBe(today);
    // Mean of s1 (1 of 4 items) and s2 (0 of 4).
    expect(body.progress.at(-1)!.completion).toBeCloseTo(0.125, 10);
    expect(body.progress.at(-1)!.attempts).toBe(3);
    expect(body.dueDates).toHaveLength(1);
  });
});

describe("GET /api/cohorts/:id/gradebook.csv", () => {
  it("exports the table, and records the export in the audit log", async () => {
    const before = await w.t.db.models.AuditLog.count({ where: { action: "grades.exported" } });
    const res = await w.own.agent.get(`/api/cohorts/${w.cohortA}/gradebook.csv`).expect(200);
    const rows = Papa.parse<string[]>(res.text.replace(/^\uFEFF/, ""), { skipEmptyLines: true }).data;
    expect(rows[0].slice(0, 4)).toEqual(["Student", "E-mail", "Completion %", "Overdue assignments"]);
    expect(rows[0]).toContain("Fixture quiz: best %");
    const s1 = rows.find((r) => r[1] === w.s1.user.email)!;
    expect(s1[2]).toBe("25");
    expect(s1[rows[0].indexOf("Fixture quiz: best %")]).toBe("50");
    expect(s1[rows[0].indexOf("Fixture quiz: attempts")]).toBe("2");
    expect(s1[rows[0].indexOf("Fixture quiz: passed")]).toBe("yes");
    expect(rows).toHaveLength(3);
    const after = await w.t.db.models.AuditLog.findAll({ where: { action: "grades.exported" } });
    expect(after.length).toBe(before + 1);
    expect(after.at(-1)!).toMatchObject({ actorId: w.own.user.id, targetType: "cohort", targetId: String(w.cohortA) });
    expect(res.headers["x-content-type-options"]).toBe("nosniff");
  });
});

describe("grouping wrong answers (wrongKey)", () => {
  const numeric = (given: string, correctAnswer: string, feedback?: string) =>
    wrongKey({ questionId: "q", kind: "numeric", correct: false, points: 1, pointsAwarded: 0, given, correctAnswer, explanation: "", feedback });
  it("groups numeric mistakes by kind, since drawn numbers differ per student", () => {
    expect(numeric("900 °C", "727 °C (accepted ±2 °C)")).toBe("Too high (outside the accepted range)");
    expect(numeric("700 °C", "727 °C (accepted ±2 °C)")).toBe("Too low (outside the accepted range)");
    expect(numeric("2000 °C", "727 °C (accepted ±2 °C)")).toBe("Far too high (over twice the answer)");
    expect(numeric("1000 K", "727 °C (accepted ±2 °C)")).toBe("Outside the accepted range");
    expect(numeric("1000 K", "727 °C (accepted ±2 °C)", "Your number is right in °C, but you chose K: check the unit.")).toBe("Right number, wrong unit");
    expect(numeric("—", "727 °C (accepted ±2 °C)", "Not answered.")).toBe("Not answered");
  });
  it("keeps the option text for choice questions", () => {
    expect(wrongKey({ questionId: "q", kind: "single", correct: false, points: 1, pointsAwarded: 0, given: "Ferrite", correctAnswer: "Austenite", explanation: "" })).toBe("Ferrite");
  });
});
