/**
 * The demo school's history: quiz attempts stored by the real grader (re-grading each stored
 * answer sheet gives the stored score, and the gradebook shows those scores), lesson progress,
 * late and overdue work, notebook entries awaiting review and reviewed (one with a photo that went
 * through the upload pipeline), and the instructor's alloy attached to the stainless lesson.
 * Seeding is all-or-nothing, deterministic, and never runs twice.
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { AttachedAlloyListResponse } from "../../shared/api/alloys";
import type { Gradebook } from "../../shared/api/gradebook";
import type { NotebookEntry, ReviewListItem } from "../../shared/api/notebook";
import type { QuestionResult } from "../../shared/api/quizzes";
import { createApp } from "../../server/app";
import { openDatabase } from "../../server/db/database";
import { daytime, DEMO_DRAW_SECRET } from "../../server/db/seed/demo-context";
import { DEMO_AUTUMN_STUDENTS, DEMO_OTHER_STUDENTS, DEMO_STUDENT, seedDemoIfEmpty } from "../../server/db/seed/demo";
import { createLogger } from "../../server/log";
import { gradeQuiz } from "../../server/quiz/grade";
import { presentQuiz } from "../../server/quiz/present";
import { attemptSeed } from "../../server/quiz/seed";
import { buildGradebook, loadCohortWork } from "../../server/services/gradebook";
import { getCourseCatalog } from "../../server/services/lessons/course";
import { createTestApp, DEMO, signIn, type TestApp } from "../support/test-app";

let t: TestApp;
let autumnId: number;
beforeAll(async () => {
  t = await createTestApp({ seedDemo: true, env: { LOGIN_RATE_LIMIT: "1000" } });
  autumnId = (await t.db.models.Cohort.findOne({ where: { name: "Autumn Forge Cohort" } }))!.id;
});
afterAll(() => t?.cleanup());

const TABLES = ["User", "Cohort", "Enrollment", "Module", "Assignment", "LessonProgress", "QuizAttempt", "NotebookEntry", "NotebookFile", "NotebookComment", "SavedAlloy", "LessonAlloy", "AuditLog"] as const;

async function rowCounts(db: TestApp["db"]): Promise<Record<string, number>> {
  const models = db.models as unknown as Record<string, { count(): Promise<number> }>;
  return Object.fromEntries(await Promise.all(TABLES.map(async (name) => [name, await models[name].count()] as const)));
}

describe("demo quiz attempts", () => {
  it("were scored by the grader: re-grading every stored answer sheet gives the stored score", async () => {
    const catalog = await getCourseCatalog();
    const rows = await t.db.models.QuizAttempt.findAll({ order: [["id", "ASC"]] });
    expect(rows.length).toBeGreaterThanOrEqual(20);
    for (const row of rows) {
      const quiz = catalog.quizzes.get(row.quizId)!;
      const regraded = gradeQuiz(quiz, row.answers as Parameters<typeof gradeQuiz>[1], row.seed, { simSchemas: catalog.simSchemas });
      expect({ id: row.id, score: row.score, maxScore: row.maxScore }).toEqual({ id: row.id, score: regraded.score, maxScore: regraded.maxScore });
      const graded = row.graded as { passed: boolean; drawNumber: number; results: QuestionResult[]; questions: unknown };
      expect(graded.passed).toBe(regraded.passed);
      expect(graded.results).toEqual(regraded.results);
      // The numbers were drawn for that attempt exactly as the quiz page draws them.
      expect(row.seed).toBe(attemptSeed(DEMO_DRAW_SECRET, row.userId, row.quizId, graded.drawNumber));
      expect(graded.questions).toEqual(presentQuiz(quiz, row.seed));
    }
    // Some right, some wrong: both passes and failures, and wrong numeric answers among them.
    const passed = rows.filter((r) => (r.graded as { passed: boolean }).passed).length;
    expect(passed).toBeGreaterThan(0);
    expect(passed).toBeLessThan(rows.length);
    const wrongNumbers = rows.flatMap((r) => (r.graded as { results: QuestionResult[] }).results).filter((r) => r.kind === "numeric" && !r.correct);
    expect(wrongNumbers.length).toBeGreaterThan(0);
  });

  it("leave the demo student's own record as the README describes it", async () => {
    const ruth = (await t.db.models.User.findOne({ where: { email: DEMO_STUDENT.email } }))!;
    expect(await t.db.models.QuizAttempt.count({ where: { userId: ruth.id } })).toBe(0);
    expect(await t.db.models.NotebookEntry.count({ where: { userId: ruth.id } })).toBe(0);
    expect(await t.db.models.LessonProgress.count({ where: { userId: ruth.id } })).toBe(2);
  });

  it("show in the instructor's gradebook with the re-graded scores (service and API agree)", async () => {
    const catalog = await getCourseCatalog();
    const cohort = (await t.db.models.Cohort.findByPk(autumnId))!;
    const book = buildGradebook(catalog, await loadCohortWork(t.db, catalog, cohort));
    const instructor = await signIn(t.app, DEMO.instructor.email);
    const viaApi = (await instructor.agent.get(`/api/cohorts/${autumnId}/gradebook`).expect(200)).body as Gradebook;
    expect({ ...viaApi, generatedAt: "" }).toEqual({ ...book, generatedAt: "" });
    expect(book.students).toHaveLength(DEMO_AUTUMN_STUDENTS.length);

    let filled = 0;
    for (const student of book.students) {
      for (const quiz of book.quizzes) {
        const rows = await t.db.models.QuizAttempt.findAll({ where: { userId: student.id, quizId: quiz.id }, order: [["submittedAt", "ASC"], ["id", "ASC"]] });
        const shares = rows.map((r) => {
          const g = gradeQuiz(catalog.quizzes.get(quiz.id)!, r.answers as Parameters<typeof gradeQuiz>[1], r.seed, { simSchemas: catalog.simSchemas });
          return g.score / g.maxScore;
        });
        const cell = student.quizzes[quiz.id];
        expect(cell.attempts).toBe(rows.length);
        if (rows.length === 0) continue;
        filled += 1;
        expect(cell.best).toBeCloseTo(Math.max(...shares), 12);
        expect(cell.latest).toBeCloseTo(shares[shares.length - 1], 12);
      }
    }
    expect(filled).toBeGreaterThanOrEqual(15);
  });

  it("include late and overdue work: finished after the due date, attempts used up, nothing done", async () => {
    const catalog = await getCourseCatalog();
    const cohort = (await t.db.models.Cohort.findByPk(autumnId))!;
    const book = buildGradebook(catalog, await loadCohortWork(t.db, catalog, cohort));
    const overdueModule = book.assignments.find((a) => a.overdue)!;
    expect(overdueModule.moduleSlug).toBe("iron-carbon-hardness");
    const byName = (name: string) => book.students.find((s) => s.displayName === name)!;

    // Tobin passed quiz 1 on his second try, after the due date: finished, so no longer overdue.
    const tobin = byName("Tobin Ashgrove");
    expect(tobin.assignments[String(overdueModule.id)]).toMatchObject({ finished: true, overdue: false });
    expect(tobin.quizzes["iron-carbon-hardness-1"]).toMatchObject({ attempts: 2, passed: true });
    expect(new Date(tobin.quizzes["iron-carbon-hardness-1"].lastAttemptAt!).getTime()).toBeGreaterThan(new Date(overdueModule.dueAt).getTime());

    // Ines used all 3 allowed attempts without passing; the quiz now refuses a fourth.
    const ines = byName("Ines Forthwell");
    expect(ines.quizzes["iron-carbon-hardness-1"]).toMatchObject({ attempts: 3, passed: false });
    expect(ines.assignments[String(overdueModule.id)].overdue).toBe(true);
    const inesSession = await signIn(t.app, "ines.forthwell@grain-edge.test");
    const view = (await inesSession.agent.get("/api/quizzes/iron-carbon-hardness-1").expect(200)).body as { attempts: { used: number; remaining: number } };
    expect(view.attempts).toMatchObject({ used: 3, remaining: 0 });

    // Kofi opened one lesson and stopped.
    expect(byName("Kofi Brannagh")).toMatchObject({ completion: 0, overdueCount: 1 });
    expect(book.students.filter((s) => s.assignments[String(overdueModule.id)].overdue).length).toBeGreaterThanOrEqual(3);
  });

  it("come with lesson progress recorded by the lesson service (completed and in progress)", async () => {
    const { LessonProgress, User } = t.db.models;
    const mara = (await User.findOne({ where: { email: DEMO_OTHER_STUDENTS[0].email } }))!;
    const rows = await LessonProgress.findAll({ where: { userId: mara.id }, order: [["openedAt", "ASC"]] });
    expect(rows.map((r) => r.lessonSlug)).toEqual(["iron-and-carbon", "hardening-and-tempering", "the-passive-film"]);
    const catalog = await getCourseCatalog();
    for (const row of rows) {
      // Completed means every section reached, in the lesson's order.
      expect(row.sectionsReached).toEqual(catalog.lessons.get(row.lessonSlug)!.sections.map((s) => s.id));
      expect(row.completedAt).not.toBeNull();
      expect(new Date(row.completedAt!).getTime()).toBeLessThan(Date.now());
    }
    expect(await LessonProgress.count({ where: { completedAt: null } })).toBeGreaterThanOrEqual(5);
  });
});

describe("demo forge notebook", () => {
  it("has entries awaiting review and reviewed ones in the demo instructor's queue", async () => {
    const instructor = await signIn(t.app, DEMO.instructor.email);
    const pending = (await instructor.agent.get("/api/notebook/review?status=unreviewed").expect(200)).body.entries as ReviewListItem[];
    expect(pending.length).toBeGreaterThanOrEqual(1);
    expect(pending.every((e) => e.cohorts.includes("Autumn Forge Cohort"))).toBe(true);
    const reviewed = (await instructor.agent.get("/api/notebook/review?status=reviewed").expect(200)).body.entries as ReviewListItem[];
    expect(reviewed.length).toBeGreaterThanOrEqual(1);
    expect(reviewed[0].review).toMatchObject({ status: "reviewed", reviewedBy: "Hale Emberton" });

    const entry = (await instructor.agent.get(`/api/notebook/entries/${reviewed.find((e) => e.title.startsWith("1095 test coupon"))!.id}`).expect(200)).body
      .entry as NotebookEntry;
    expect(entry.comments).toHaveLength(1);
    expect(entry.comments[0]).toMatchObject({ author: "Hale Emberton", status: "reviewed", notification: "none" });
    // The core's numbers come from the stored inputs: 2 tempers of 1 h at 200 °C.
    // Hollomon & Jaffe, "Time-temperature relations in tempering steel", Trans. AIME 162 (1945):
    // P = T_K (20 + log10 t_h) = 473.15 × (20 + log10 2) = 9605.43 (science-reference §5.1, check 1).
    expect(entry.computation.tempering?.parameter).toBeCloseTo(9605.43, 2);
    expect(entry.computation.readings.count).toBe(3);
  });

  it("has a synthetic photo stored through the upload pipeline, with a 320 px thumbnail", async () => {
    const instructor = await signIn(t.app, DEMO.instructor.email);
    const all = (await instructor.agent.get("/api/notebook/review?status=all").expect(200)).body.entries as ReviewListItem[];
    const withPhoto = all.filter((e) => e.coverThumbUrl);
    expect(withPhoto.length).toBeGreaterThanOrEqual(1);
    const entry = (await instructor.agent.get(`/api/notebook/entries/${withPhoto[0].id}`).expect(200)).body.entry as NotebookEntry;
    expect(entry.files[0]).toMatchObject({ kind: "image", mimeType: "image/webp", width: 640, height: 240 });
    const thumb = await instructor.agent.get(withPhoto[0].coverThumbUrl!).buffer(true).expect(200);
    expect(thumb.headers["content-type"]).toBe("image/webp");
    const meta = await sharp(thumb.body as Buffer).metadata();
    expect([meta.format, meta.width]).toEqual(["webp", 320]);
  });
});

describe("demo alloy on the stainless lesson", () => {
  it("is returned by GET /api/lessons/:slug/attached-alloys, owned by the demo instructor", async () => {
    const student = await signIn(t.app, DEMO.student.email);
    const seen = (await student.agent.get("/api/lessons/carbon-chromium-and-pitting/attached-alloys").expect(200)).body as AttachedAlloyListResponse;
    expect(seen.attachments).toHaveLength(1);
    expect(seen.attachments[0]).toMatchObject({
      lessonSlug: "carbon-chromium-and-pitting",
      name: "Cinderfield fine-carbide stainless",
      composition: { C: 0.62, Cr: 13.8, Mo: 0.2, Mn: 0.6, Si: 0.4 },
      attachedBy: "Hale Emberton",
      yours: false,
    });
    expect(seen.attachments[0].note).toContain("440C and D2");
    const instructor = await signIn(t.app, DEMO.instructor.email);
    const mine = (await instructor.agent.get("/api/alloys").expect(200)).body.alloys as { id: number }[];
    expect(mine.map((a) => a.id)).toEqual([seen.attachments[0].alloyId]);
    const own = (await instructor.agent.get("/api/lessons/carbon-chromium-and-pitting/attached-alloys").expect(200)).body as AttachedAlloyListResponse;
    expect(own.attachments[0].yours).toBe(true);
  });
});

describe("seeding again", () => {
  it("adds nothing: not by calling the seed, not by starting the app on the same database", async () => {
    const before = await rowCounts(t.db);
    const uploads = fs.readdirSync(path.join(t.dir, "uploads")).sort();
    expect(uploads).toHaveLength(4); // two photos, each with its thumbnail
    expect(await seedDemoIfEmpty(t.db, t.logger)).toBe(false);
    const restarted = await createApp(t.config);
    await restarted.close();
    expect(await rowCounts(t.db)).toEqual(before);
    expect(fs.readdirSync(path.join(t.dir, "uploads")).sort()).toEqual(uploads);
  });
});

describe("daytime moments of the history", () => {
  it("keep the order of events, stay before now, and fall between 09:00 and 21:00 UTC when old enough", () => {
    const now = new Date("2026-03-10T04:15:00Z"); // early morning: recent events must not land after now
    const when = daytime(now);
    let previous = -Infinity;
    for (let daysAgo = 20; daysAgo >= 0.01; daysAgo -= 0.01) {
      const t = when(daysAgo).getTime();
      expect(t).toBeGreaterThanOrEqual(previous);
      expect(t).toBeLessThan(now.getTime());
      previous = t;
    }
    // Two days ago at 04:15 moves to 11:07:30 the same day (09:00 + 4.25 h / 2); 11.5 days ago, 16:15, to 17:07:30.
    expect(when(2).toISOString()).toBe("2026-03-08T11:07:30.000Z");
    expect(when(11.5).toISOString()).toBe("2026-02-26T17:07:30.000Z");
  });
});

describe("seeding a fresh database", () => {
  const dirs: string[] = [];
  const tempDb = async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "grain-edge-seed-"));
    dirs.push(dir);
    return { dir, db: await openDatabase({ storage: path.join(dir, "seed.sqlite"), logger: createLogger("silent") }) };
  };
  afterAll(() => dirs.forEach((d) => fs.rmSync(d, { recursive: true, force: true })));

  it("is deterministic: the same moment gives the same answers, scores and entries", async () => {
    const now = new Date("2025-03-14T09:00:00Z");
    const snapshot = async () => {
      const { db } = await tempDb();
      try {
        expect(await seedDemoIfEmpty(db, createLogger("silent"), { now })).toBe(true);
        const attempts = await db.models.QuizAttempt.findAll({ order: [["id", "ASC"]], raw: true });
        const entries = await db.models.NotebookEntry.findAll({ order: [["id", "ASC"]], raw: true });
        return {
          attempts: attempts.map((a) => [a.userId, a.quizId, a.seed, a.score, JSON.stringify(a.answers), new Date(a.submittedAt).toISOString()]),
          entries: entries.map((e) => [e.userId, e.title, e.workedOn, e.reviewStatus]),
        };
      } finally {
        await db.close();
      }
    };
    const first = await snapshot();
    expect(first.attempts.length).toBeGreaterThan(0);
    expect(await snapshot()).toEqual(first);
  });

  it("is all or nothing: a failure part-way leaves no rows and no files, and the next start seeds", async () => {
    const { dir, db } = await tempDb();
    try {
      // A file where the uploads folder should be: storing the first photo fails.
      fs.writeFileSync(path.join(dir, "uploads"), "not a folder");
      await expect(seedDemoIfEmpty(db, createLogger("silent"))).rejects.toThrow();
      expect(await db.models.User.count()).toBe(0);
      expect(await db.models.QuizAttempt.count()).toBe(0);
      fs.rmSync(path.join(dir, "uploads"));
      expect(await seedDemoIfEmpty(db, createLogger("silent"))).toBe(true);
      expect(fs.readdirSync(path.join(dir, "uploads"))).toHaveLength(4);
    } finally {
      await db.close();
    }
  });
});
