/**
 * Due-date reminders: students who have not finished an assignment due within N days get one
 * e-mail; finished, disabled, archived-cohort and far-off work get none; running the job twice,
 * or twice at once, sends nothing twice; a failed send is retried by the next run.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createLogger } from "../../server/log";
import type { Mailer } from "../../server/mail/mailer";
import { teachingRuntimeOf } from "../../server/mail/runtime";
import { getCourseCatalog } from "../../server/services/lessons/course";
import { REMINDER_KIND, runReminders } from "../../server/services/reminders";
import { createTeachingWorld, outbox, PASSING_ANSWERS, submitQuiz, type TeachingWorld } from "./teaching-fixture";

const DAY_MS = 86_400_000;
let w: TeachingWorld;

async function deps(mailer?: Mailer) {
  const rt = teachingRuntimeOf(w.t.db)!;
  return { db: w.t.db, mailer: mailer ?? rt.mailer, settings: rt.settings, logger: createLogger("silent"), catalog: await getCourseCatalog() };
}

const logsFor = (userId: number) => w.t.db.models.ReminderLog.findAll({ where: { userId } });

beforeAll(async () => {
  w = await createTeachingWorld();
  // s1 finishes the assigned module: both lessons completed, both quizzes passed.
  for (const [slug, sections] of [["first-lesson", ["heat", "film", "quiz"]], ["second-lesson", ["tables", "quiz"]]] as const) {
    await w.s1.agent.put(`/api/lessons/${slug}/progress`).set("x-csrf-token", w.s1.csrfToken).send({ sectionsReached: sections }).expect(200);
  }
  await submitQuiz(w.s1, "fixture-quiz", PASSING_ANSWERS);
  await submitQuiz(w.s1, "fixture-quiz-2", { q1: { kind: "single", choice: "a" } });
});
afterAll(() => w?.t.cleanup());

describe("runReminders", () => {
  it("e-mails only the student who has not finished work due within the window (default 2 days)", async () => {
    expect(teachingRuntimeOf(w.t.db)!.settings.reminderDaysBefore).toBe(2);
    const result = await runReminders(await deps());
    expect(result).toEqual({ candidates: 1, sent: 1, failed: 0, skipped: 0 });
    const mail = (await outbox(w.t)).filter((m) => m.toAddress === w.s2.user.email);
    expect(mail).toHaveLength(1);
    expect(mail[0].subject).toMatch(/^Due \d{1,2} \w+ \d{4}: Fixture basics \(Autumn Forge Cohort\)$/);
    expect(mail[0].text).toContain("0 of 2 lessons completed, 0 of 2 quizzes passed");
    expect(mail[0].text).toMatch(/http:\/\/localhost:\d+\/learn/);
    expect(mail[0].html).toContain("Continue learning");
    expect(await logsFor(w.s1.user.id)).toHaveLength(0);
    const [log] = await logsFor(w.s2.user.id);
    expect(log).toMatchObject({ assignmentId: w.assignmentA, kind: REMINDER_KIND, attempts: 1 });
    expect(log.sentAt).not.toBeNull();
  });

  it("is safe to run again: nothing is sent twice", async () => {
    const before = (await outbox(w.t)).length;
    const again = await runReminders(await deps());
    expect(again).toEqual({ candidates: 1, sent: 0, failed: 0, skipped: 1 });
    expect((await outbox(w.t)).length).toBe(before);
    expect(await logsFor(w.s2.user.id)).toHaveLength(1);
  });

  it("two runs at the same moment send one e-mail between them", async () => {
    // s3's cohort gets an assignment due tomorrow.
    await w.t.db.write((tx) => w.t.db.models.Assignment.create({ cohortId: w.cohortB, moduleId: w.moduleId, dueAt: new Date(Date.now() + DAY_MS), maxAttemptsPerQuiz: null }, { transaction: tx }));
    const d = await deps();
    const [a, b] = await Promise.all([runReminders(d), runReminders(d)]);
    expect(a.sent + b.sent).toBe(1);
    expect((await outbox(w.t)).filter((m) => m.toAddress === w.s3.user.email)).toHaveLength(1);
  });

  it("leaves out work due later than the window, past due dates, disabled students and archived cohorts", async () => {
    const d = await deps();
    const now = new Date();
    // Three days before the later due date nothing is in the window yet...
    const early = await runReminders(d, new Date(now.getTime() - 2 * DAY_MS));
    expect(early.candidates).toBe(0);
    // ...and after the due date nothing is reminded either.
    expect((await runReminders(d, new Date(now.getTime() + 3 * DAY_MS))).candidates).toBe(0);
    await w.t.db.write((tx) => w.t.db.models.User.update({ disabledAt: new Date() }, { where: { id: w.s2.user.id }, transaction: tx }));
    await w.t.db.write((tx) => w.t.db.models.Cohort.update({ archivedAt: new Date() }, { where: { id: w.cohortB }, transaction: tx }));
    try {
      expect((await runReminders(d)).candidates).toBe(0);
    } finally {
      await w.t.db.write((tx) => w.t.db.models.User.update({ disabledAt: null }, { where: { id: w.s2.user.id }, transaction: tx }));
      await w.t.db.write((tx) => w.t.db.models.Cohort.update({ archivedAt: null }, { where: { id: w.cohortB }, transaction: tx }));
    }
  });

  it("a failed send is not recorded as sent, and the next run retries it", async () => {
    // A new student joins cohort A; the mail server fails once.
    const newcomer = await w.t.db.write(async (tx) => {
      const user = await w.t.db.models.User.create({ email: "late.joiner@cinderfield.test", displayName: "Late Joiner", role: "student", passwordHash: "x" }, { transaction: tx });
      await w.t.db.models.Enrollment.create({ cohortId: w.cohortA, studentId: user.id }, { transaction: tx });
      return user;
    });
    const real = teachingRuntimeOf(w.t.db)!.mailer;
    let calls = 0;
    const flaky: Mailer = {
      fakeTransport: true,
      async send(mail) {
        calls += 1;
        if (calls === 1) throw Object.assign(new Error("connect ECONNREFUSED"), { code: "ECONNREFUSED" });
        return real.send(mail);
      },
      close: async () => undefined,
    };
    const first = await runReminders(await deps(flaky));
    expect(first.failed).toBe(1);
    const [log] = await logsFor(newcomer.id);
    expect(log.sentAt).toBeNull();
    expect(log.claimedAt).toBeNull();
    const second = await runReminders(await deps(flaky));
    expect(second.sent).toBe(1);
    const [after] = await logsFor(newcomer.id);
    expect(after.sentAt).not.toBeNull();
    expect(after.attempts).toBe(2);
    expect((await outbox(w.t)).filter((m) => m.toAddress === "late.joiner@cinderfield.test")).toHaveLength(1);
  });

  it("moving the due date clears unsent reminders so the new date gets one", async () => {
    const { ReminderLog } = w.t.db.models;
    await w.t.db.write((tx) => ReminderLog.create({ userId: w.s2.user.id, assignmentId: w.assignmentA, kind: "test-unsent" }, { transaction: tx }));
    await w.own.agent
      .patch(`/api/cohorts/${w.cohortA}/assignments/${w.assignmentA}`)
      .set("x-csrf-token", w.own.csrfToken)
      .send({ dueAt: new Date(Date.now() + DAY_MS).toISOString() })
      .expect(204);
    expect(await ReminderLog.count({ where: { assignmentId: w.assignmentA, kind: "test-unsent" } })).toBe(0);
    expect(await ReminderLog.count({ where: { assignmentId: w.assignmentA, kind: REMINDER_KIND } })).toBeGreaterThan(0); // sent ones stay
  });
});

describe("the jobs timer", () => {
  it("is off in tests (NODE_ENV=test): jobs run only when invoked", () => {
    expect(teachingRuntimeOf(w.t.db)!.settings.runJobs).toBe(false);
  });
});
