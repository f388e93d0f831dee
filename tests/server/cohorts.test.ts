/**
 * Cohorts and assignments: listing shows only what the caller may see, create/rename/archive,
 * removing and moving students, assignments with due dates and attempt limits (which the quiz
 * engine enforces), the student's own list and the instructor dashboard.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTeachingWorld, FAILING_ANSWERS, PASSING_ANSWERS, submitQuiz, type TeachingWorld } from "./teaching-fixture";

let w: TeachingWorld;
beforeAll(async () => {
  w = await createTeachingWorld();
});
afterAll(() => w?.t.cleanup());

const names = (body: { cohorts: { name: string }[] }) => body.cohorts.map((c) => c.name);

describe("GET /api/cohorts", () => {
  it("lists only the instructor's own cohorts, all of them for an admin", async () => {
    expect(names((await w.own.agent.get("/api/cohorts").expect(200)).body)).toEqual(["Autumn Forge Cohort"]);
    expect(names((await w.other.agent.get("/api/cohorts").expect(200)).body)).toEqual(["Weekend Bladesmiths"]);
    expect(names((await w.admin.agent.get("/api/cohorts").expect(200)).body).sort()).toEqual(["Autumn Forge Cohort", "Weekend Bladesmiths"]);
    const [a] = (await w.own.agent.get("/api/cohorts").expect(200)).body.cohorts;
    expect(a).toMatchObject({ studentCount: 2, assignmentCount: 1, archived: false, instructor: { id: w.own.user.id } });
  });

  it("is closed to students (403) and to anonymous callers (401)", async () => {
    await w.s1.agent.get("/api/cohorts").expect(403);
  });
});

describe("creating, renaming and archiving", () => {
  let id: number;
  it("an instructor creates a cohort they teach; instructorId is for admins only", async () => {
    const res = await w.own.agent.post("/api/cohorts").set("x-csrf-token", w.own.csrfToken).send({ name: "  Spring Quench Cohort  " }).expect(201);
    expect(res.body.cohort).toMatchObject({ name: "Spring Quench Cohort", instructor: { id: w.own.user.id }, studentCount: 0 });
    id = res.body.cohort.id;
    const count = await w.t.db.models.Cohort.count();
    await w.own.agent.post("/api/cohorts").set("x-csrf-token", w.own.csrfToken).send({ name: "Hijack", instructorId: w.other.user.id }).expect(403);
    expect(await w.t.db.models.Cohort.count()).toBe(count);
  });

  it("an admin creates a cohort for an instructor, and not for a student", async () => {
    const res = await w.admin.agent.post("/api/cohorts").set("x-csrf-token", w.admin.csrfToken).send({ name: "Evening Grinders", instructorId: w.other.user.id }).expect(201);
    expect(res.body.cohort.instructor.id).toBe(w.other.user.id);
    const bad = await w.admin.agent.post("/api/cohorts").set("x-csrf-token", w.admin.csrfToken).send({ name: "Nope", instructorId: w.s1.user.id }).expect(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(["instructorId"]);
  });

  it("validates names: control characters, length, unknown fields", async () => {
    for (const body of [{ name: "A\r\nB" }, { name: "x" }, { name: "y".repeat(121) }, { name: "Fine name", role: "admin" }]) {
      const res = await w.own.agent.post("/api/cohorts").set("x-csrf-token", w.own.csrfToken).send(body);
      expect({ body, status: res.status }).toEqual({ body, status: 400 });
    }
  });

  it("renames and archives; an archived cohort refuses changes until restored", async () => {
    await w.own.agent.patch(`/api/cohorts/${id}`).set("x-csrf-token", w.own.csrfToken).send({ name: "Spring Temper Cohort" }).expect(200);
    const archived = await w.own.agent.patch(`/api/cohorts/${id}`).set("x-csrf-token", w.own.csrfToken).send({ archived: true }).expect(200);
    expect(archived.body.cohort).toMatchObject({ name: "Spring Temper Cohort", archived: true });
    const refused = await w.own.agent
      .post(`/api/cohorts/${id}/invitations`)
      .set("x-csrf-token", w.own.csrfToken)
      .send({ invitations: [{ email: "late@cinderfield.test" }] })
      .expect(409);
    expect(refused.body.error.code).toBe("cohort_archived");
    const active = (await w.own.agent.get("/api/cohorts?archived=exclude").expect(200)).body;
    expect(names(active)).not.toContain("Spring Temper Cohort");
    await w.own.agent.patch(`/api/cohorts/${id}`).set("x-csrf-token", w.own.csrfToken).send({ archived: false }).expect(200);
    const audit = await w.t.db.models.AuditLog.findAll({ where: { action: "cohort.updated", targetId: String(id) } });
    expect(audit.length).toBe(3);
  });

  it("another instructor's cohort answers 404, whether it exists or not", async () => {
    const theirs = await w.own.agent.get(`/api/cohorts/${w.cohortB}`).expect(404);
    const missing = await w.own.agent.get(`/api/cohorts/999999`).expect(404);
    expect(theirs.body).toEqual(missing.body);
    await w.own.agent.get(`/api/cohorts/abc`).expect(400);
  });
});

describe("students: remove and move", () => {
  it("moves a student only into a cohort the instructor also teaches", async () => {
    const spring = (await w.own.agent.post("/api/cohorts").set("x-csrf-token", w.own.csrfToken).send({ name: "Move Target" }).expect(201)).body.cohort.id;
    // Into someone else's cohort: 404, nothing changes.
    await w.own.agent
      .post(`/api/cohorts/${w.cohortA}/students/${w.s2.user.id}/move`)
      .set("x-csrf-token", w.own.csrfToken)
      .send({ toCohortId: w.cohortB })
      .expect(404);
    expect(await w.t.db.models.Enrollment.count({ where: { cohortId: w.cohortA, studentId: w.s2.user.id } })).toBe(1);
    await w.own.agent
      .post(`/api/cohorts/${w.cohortA}/students/${w.s2.user.id}/move`)
      .set("x-csrf-token", w.own.csrfToken)
      .send({ toCohortId: spring })
      .expect(204);
    expect(await w.t.db.models.Enrollment.count({ where: { cohortId: w.cohortA, studentId: w.s2.user.id } })).toBe(0);
    expect(await w.t.db.models.Enrollment.count({ where: { cohortId: spring, studentId: w.s2.user.id } })).toBe(1);
    // And back again, for the other tests.
    await w.own.agent.post(`/api/cohorts/${spring}/students/${w.s2.user.id}/move`).set("x-csrf-token", w.own.csrfToken).send({ toCohortId: w.cohortA }).expect(204);
  });

  it("removing a student who is not in the cohort is a 404", async () => {
    await w.own.agent.delete(`/api/cohorts/${w.cohortA}/students/${w.s3.user.id}`).set("x-csrf-token", w.own.csrfToken).expect(404);
  });
});

describe("assignments", () => {
  it("lists the cohort's assignments with the course's modules for the editor", async () => {
    const res = await w.own.agent.get(`/api/cohorts/${w.cohortA}/assignments`).expect(200);
    expect(res.body.assignments).toHaveLength(1);
    expect(res.body.assignments[0]).toMatchObject({ module: { slug: "basics", lessonCount: 2, quizCount: 2 }, maxAttemptsPerQuiz: 3, finishedCount: 0, studentCount: 2, overdue: false });
    expect(res.body.modules).toEqual([expect.objectContaining({ slug: "basics", assigned: true })]);
  });

  it("refuses a second assignment of the same module and an unknown module", async () => {
    const dueAt = new Date(Date.now() + 86_400_000).toISOString();
    const dup = await w.own.agent.post(`/api/cohorts/${w.cohortA}/assignments`).set("x-csrf-token", w.own.csrfToken).send({ moduleSlug: "basics", dueAt, maxAttemptsPerQuiz: null }).expect(409);
    expect(dup.body.error.code).toBe("already_assigned");
    await w.own.agent.post(`/api/cohorts/${w.cohortA}/assignments`).set("x-csrf-token", w.own.csrfToken).send({ moduleSlug: "no-such-module", dueAt, maxAttemptsPerQuiz: null }).expect(400);
    await w.own.agent.post(`/api/cohorts/${w.cohortA}/assignments`).set("x-csrf-token", w.own.csrfToken).send({ moduleSlug: "basics", dueAt: "next tuesday", maxAttemptsPerQuiz: 0 }).expect(400);
  });

  it("assigns a module to another cohort (creating it there), and the attempt limit binds the quiz engine", async () => {
    const dueAt = new Date(Date.now() + 5 * 86_400_000).toISOString();
    await w.other.agent.post(`/api/cohorts/${w.cohortB}/assignments`).set("x-csrf-token", w.other.csrfToken).send({ moduleSlug: "basics", dueAt, maxAttemptsPerQuiz: 1 }).expect(201);
    await submitQuiz(w.s3, "fixture-quiz-2", {});
    const second = await w.s3.agent
      .post("/api/quizzes/fixture-quiz-2/attempts")
      .set("x-csrf-token", w.s3.csrfToken)
      .send({ idempotencyKey: "second-attempt-key-1", drawId: 2, answers: {} });
    expect(second.status).toBe(409);
    expect(second.body.error.code).toBe("attempt_limit_reached");
    // Raising the limit lets the student try again.
    const list = await w.other.agent.get(`/api/cohorts/${w.cohortB}/assignments`).expect(200);
    await w.other.agent.patch(`/api/cohorts/${w.cohortB}/assignments/${list.body.assignments[0].id}`).set("x-csrf-token", w.other.csrfToken).send({ maxAttemptsPerQuiz: 2 }).expect(204);
    expect((await w.s3.agent.get("/api/quizzes/fixture-quiz-2").expect(200)).body.attempts).toMatchObject({ used: 1, limit: 2, remaining: 1 });
  });
});

describe("GET /api/assignments (student home)", () => {
  it("shows due, then done after every lesson is completed and every quiz passed", async () => {
    const before = await w.s1.agent.get("/api/assignments").expect(200);
    expect(before.body.assignments).toHaveLength(1);
    expect(before.body.assignments[0]).toMatchObject({
      state: "due",
      cohort: { name: "Autumn Forge Cohort" },
      module: { slug: "basics" },
      progress: { lessonsDone: 0, lessonsTotal: 2, quizzesPassed: 0, quizzesTotal: 2, share: 0 },
      next: { lessonSlug: "first-lesson" },
    });
    await submitQuiz(w.s1, "fixture-quiz", FAILING_ANSWERS);
    expect((await w.s1.agent.get("/api/assignments")).body.assignments[0].progress.quizzesPassed).toBe(0);
    await submitQuiz(w.s1, "fixture-quiz", PASSING_ANSWERS);
    const mid = (await w.s1.agent.get("/api/assignments")).body.assignments[0];
    expect(mid.progress).toMatchObject({ quizzesPassed: 1, share: 0.25 });
    // Complete both lessons (reach every section) and pass the second quiz (its only question).
    for (const [slug, sections] of [["first-lesson", ["heat", "film", "quiz"]], ["second-lesson", ["tables", "quiz"]]] as const) {
      await w.s1.agent.put(`/api/lessons/${slug}/progress`).set("x-csrf-token", w.s1.csrfToken).send({ sectionsReached: sections }).expect(200);
    }
    expect((await w.s1.agent.get("/api/assignments")).body.assignments[0]).toMatchObject({ state: "due", progress: { lessonsDone: 2, share: 0.75 }, next: { lessonSlug: "second-lesson" } });
    await submitQuiz(w.s1, "fixture-quiz-2", { q1: { kind: "single", choice: "a" } });
    const done = (await w.s1.agent.get("/api/assignments")).body.assignments[0];
    expect(done).toMatchObject({ state: "done", progress: { share: 1 }, next: null });
    expect((await w.own.agent.get(`/api/cohorts/${w.cohortA}/assignments`)).body.assignments[0].finishedCount).toBe(1);
  });

  it("is empty for an instructor and for a student in no cohort", async () => {
    expect((await w.own.agent.get("/api/assignments").expect(200)).body.assignments).toEqual([]);
    expect((await w.outsider.agent.get("/api/assignments").expect(200)).body.assignments).toEqual([]);
  });

  it("marks an unfinished assignment past its due date as overdue", async () => {
    await w.t.db.write((tx) => w.t.db.models.Assignment.update({ dueAt: new Date(Date.now() - 3_600_000) }, { where: { id: w.assignmentA }, transaction: tx }));
    const res = await w.s2.agent.get("/api/assignments").expect(200);
    expect(res.body.assignments[0].state).toBe("overdue");
    await w.t.db.write((tx) => w.t.db.models.Assignment.update({ dueAt: new Date(Date.now() + 2 * 86_400_000) }, { where: { id: w.assignmentA }, transaction: tx }));
  });
});

describe("GET /api/teaching/overview (dashboard)", () => {
  it("names who is behind and what is due soon, only for the instructor's own cohorts", async () => {
    await w.t.db.write((tx) => w.t.db.models.Assignment.update({ dueAt: new Date(Date.now() - 3_600_000) }, { where: { id: w.assignmentA }, transaction: tx }));
    const res = await w.own.agent.get("/api/teaching/overview").expect(200);
    const cohortNames = res.body.cohorts.map((c: { name: string }) => c.name);
    expect(cohortNames).toContain("Autumn Forge Cohort");
    expect(cohortNames).not.toContain("Weekend Bladesmiths");
    const behind = res.body.behind.map((b: { student: { id: number } }) => b.student.id);
    expect(behind).toContain(w.s2.user.id); // nothing done, past due
    const autumn = res.body.cohorts.find((c: { name: string }) => c.name === "Autumn Forge Cohort");
    expect(autumn.behindCount).toBeGreaterThanOrEqual(1);
    await w.t.db.write((tx) => w.t.db.models.Assignment.update({ dueAt: new Date(Date.now() + 2 * 86_400_000) }, { where: { id: w.assignmentA }, transaction: tx }));
    const soon = await w.own.agent.get("/api/teaching/overview").expect(200);
    expect(soon.body.behind).toEqual([]);
    expect(soon.body.dueSoon.map((d: { assignmentId: number }) => d.assignmentId)).toEqual([w.assignmentA]);
    await w.s1.agent.get("/api/teaching/overview").expect(403);
  });
});
