/**
 * The lesson API: the course outline with the learner's progress (GET /api/modules),
 * and per-lesson progress — opened, sections reached, checks answered, resume point.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import type { LessonProgress, ModulesResponse } from "../../shared/api/lessons";
import { createTestApp, type TestApp } from "../support/test-app";
import { newKey, newStudent, seedFixtureModule } from "./course-fixture";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
  await seedFixtureModule(t);
});
afterAll(() => t?.cleanup());

type Session = Awaited<ReturnType<typeof newStudent>>;
const put = (s: Session, slug: string, body: object) => s.agent.put(`/api/lessons/${slug}/progress`).set("x-csrf-token", s.csrfToken).send(body);

describe("GET /api/modules", () => {
  it("lists modules in manifest order with their lessons, sections and quiz ids", async () => {
    expect((await request(t.app).get("/api/modules")).status).toBe(401);
    const s = await newStudent(t);
    const res = await s.agent.get("/api/modules");
    expect(res.status).toBe(200);
    const { modules } = res.body as ModulesResponse;
    expect(modules.map((m) => m.slug)).toEqual(["basics"]);
    expect(modules[0]).toMatchObject({ title: "Fixture basics", order: 1 });
    expect(modules[0].lessons.map((l) => [l.slug, l.order, l.quizId])).toEqual([
      ["first-lesson", 1, "fixture-quiz"],
      ["second-lesson", 2, "fixture-quiz-2"],
    ]);
    const first = modules[0].lessons[0];
    expect(first).toMatchObject({ title: "Fixture lesson one", minutes: 20, objectives: ["Read a fixture.", "Quote a value: with a colon."] });
    expect(first.sections).toEqual([
      { id: "heat", title: "Heat and crystals" },
      { id: "film", title: "The film" },
      { id: "quiz", title: "Quiz" },
    ]);
    expect(first.progress).toEqual({ openedAt: null, sectionsReached: 0, lastSection: null, completedAt: null });
    expect(first.quiz).toEqual({ attempts: 0, bestScore: null, maxScore: 6, passed: false });
  });

  it("shows this learner's progress and best quiz score, not anyone else's", async () => {
    const a = await newStudent(t);
    const b = await newStudent(t);
    await put(a, "second-lesson", { sectionsReached: ["tables"], lastSection: "tables" });
    for (const choice of ["b", "a", "b"]) {
      await a.agent.post("/api/quizzes/fixture-quiz-2/attempts").set("x-csrf-token", a.csrfToken).send({ idempotencyKey: newKey(), drawId: 1, answers: { q1: { kind: "single", choice } } }).expect(201);
    }
    const mine = ((await a.agent.get("/api/modules")).body as ModulesResponse).modules[0].lessons[1];
    expect(mine.progress).toMatchObject({ sectionsReached: 1, lastSection: "tables", completedAt: null });
    expect(mine.progress.openedAt).not.toBeNull();
    expect(mine.quiz).toEqual({ attempts: 3, bestScore: 1, maxScore: 1, passed: true });
    const theirs = ((await b.agent.get("/api/modules")).body as ModulesResponse).modules[0].lessons[1];
    expect(theirs.progress.openedAt).toBeNull();
    expect(theirs.quiz!.attempts).toBe(0);
  });
});

describe("lesson progress", () => {
  it("starts empty, records the opening, merges sections, saves checks and the resume point", async () => {
    const s = await newStudent(t);
    const empty = (await s.agent.get("/api/lessons/first-lesson/progress")).body as LessonProgress;
    expect(empty).toEqual({ lessonSlug: "first-lesson", openedAt: null, sectionsReached: [], lastSection: null, checks: {}, completedAt: null });

    const opened = (await put(s, "first-lesson", {}).expect(200)).body as LessonProgress;
    expect(opened.openedAt).not.toBeNull();
    await put(s, "first-lesson", { sectionsReached: ["film"], lastSection: "film" }).expect(200);
    await put(s, "first-lesson", { sectionsReached: ["heat"], checks: { c1: { choice: 0, correct: false } } }).expect(200);
    const later = (await put(s, "first-lesson", { checks: { c1: { choice: 1, correct: true } } }).expect(200)).body as LessonProgress;
    // Sections are kept in lesson order and never removed; the resume point stays until moved.
    expect(later).toMatchObject({ sectionsReached: ["heat", "film"], lastSection: "film", checks: { c1: { choice: 1, correct: true } }, completedAt: null });
    expect(later.openedAt).toBe(opened.openedAt);

    const done = (await put(s, "first-lesson", { sectionsReached: ["quiz"], lastSection: "quiz" }).expect(200)).body as LessonProgress;
    expect(done.sectionsReached).toEqual(["heat", "film", "quiz"]);
    expect(done.completedAt).not.toBeNull();
    const reread = (await s.agent.get("/api/lessons/first-lesson/progress")).body as LessonProgress;
    expect(reread).toEqual(done);
  });

  it("parallel updates from two tabs lose nothing", async () => {
    const s = await newStudent(t);
    await Promise.all([
      put(s, "first-lesson", { sectionsReached: ["heat"] }),
      put(s, "first-lesson", { sectionsReached: ["film"] }),
      put(s, "first-lesson", { checks: { c1: { choice: 1, correct: true } } }),
      put(s, "first-lesson", { sectionsReached: ["quiz"] }),
    ]);
    const after = (await s.agent.get("/api/lessons/first-lesson/progress")).body as LessonProgress;
    expect(after.sectionsReached).toEqual(["heat", "film", "quiz"]);
    expect(after.checks).toEqual({ c1: { choice: 1, correct: true } });
    expect(await t.db.read(() => t.db.models.LessonProgress.count({ where: { userId: s.user.id } }))).toBe(1);
  });

  it("rejects unknown lessons, sections, checks and fields", async () => {
    const s = await newStudent(t);
    expect((await s.agent.get("/api/lessons/no-such-lesson/progress")).status).toBe(404);
    expect((await put(s, "no-such-lesson", {})).status).toBe(404);
    const badSection = await put(s, "first-lesson", { sectionsReached: ["tables"] });
    expect(badSection.status).toBe(400);
    expect(badSection.body.error.fields.sectionsReached[0]).toMatch(/no section “tables”/);
    expect((await put(s, "first-lesson", { checks: { nope: { choice: 0, correct: true } } })).status).toBe(400);
    expect((await put(s, "first-lesson", { lastSection: "nowhere" })).status).toBe(400);
    expect((await put(s, "first-lesson", { completedAt: "2020-01-01" })).status).toBe(400);
    expect((await put(s, "first-lesson", { checks: { c1: { choice: -1, correct: true } } })).status).toBe(400);
    expect((await put(s, "first-lesson", { sectionsReached: "heat" })).status).toBe(400);
    expect(await t.db.read(() => t.db.models.LessonProgress.count({ where: { userId: s.user.id } }))).toBe(0);
  });

  it("needs a session and a CSRF token", async () => {
    expect((await request(t.app).get("/api/lessons/first-lesson/progress")).status).toBe(401);
    const s = await newStudent(t);
    expect((await s.agent.put("/api/lessons/first-lesson/progress").send({})).status).toBe(403);
  });
});
