/**
 * Shared setup for the instructors' workflow tests (cohorts, invitations, gradebook, admin,
 * access matrix, reminders, roster): an app over the fixture course (tests/content/fixtures/course,
 * module "basics" with two lessons and two quizzes), and a small school:
 *
 *   instructor "own"   teaches cohort A (students s1, s2; "basics" assigned, due in 2 days, 3 attempts)
 *   instructor "other" teaches cohort B (student s3)
 *   admin, and a student "outsider" in no cohort.
 */
import { expect } from "vitest";
import type { PublicUser } from "../../shared/api/auth";
import { teachingRuntimeOf } from "../../server/mail/runtime";
import { newKey, seedFixtureModule } from "./course-fixture";
import { createTestApp, createUser, signIn, type Agent, type TestApp } from "../support/test-app";

export const PASSWORD = "quench-and-temper-9";
const DAY_MS = 86_400_000;

export interface Signed {
  user: PublicUser;
  agent: Agent;
  csrfToken: string;
}

export interface TeachingWorld {
  t: TestApp;
  moduleId: number;
  cohortA: number;
  cohortB: number;
  assignmentA: number;
  own: Signed;
  other: Signed;
  admin: Signed;
  s1: Signed;
  s2: Signed;
  s3: Signed;
  outsider: Signed;
}

let counter = 0;

export async function signedUser(t: TestApp, role: PublicUser["role"], name: string): Promise<Signed> {
  counter += 1;
  const user = await createUser(t, { email: `${name}-${counter}@cinderfield.test`, role, password: PASSWORD, displayName: `${name[0].toUpperCase()}${name.slice(1)} ${counter}` });
  const s = await signIn(t.app, user.email, PASSWORD);
  return { user, agent: s.agent, csrfToken: s.csrfToken };
}

export async function createTeachingWorld(options: { env?: Record<string, string> } = {}): Promise<TeachingWorld> {
  const t = await createTestApp({ env: { LOGIN_RATE_LIMIT: "1000", ...options.env } });
  const moduleId = await seedFixtureModule(t);
  const [own, other, admin, s1, s2, s3, outsider] = [
    await signedUser(t, "instructor", "hale"),
    await signedUser(t, "instructor", "sefa"),
    await signedUser(t, "admin", "odile"),
    await signedUser(t, "student", "mara"),
    await signedUser(t, "student", "tobin"),
    await signedUser(t, "student", "ines"),
    await signedUser(t, "student", "wren"),
  ];
  const ids = await t.db.write(async (transaction) => {
    const { Cohort, Enrollment, Assignment } = t.db.models;
    const a = await Cohort.create({ name: "Autumn Forge Cohort", instructorId: own.user.id }, { transaction });
    const b = await Cohort.create({ name: "Weekend Bladesmiths", instructorId: other.user.id }, { transaction });
    await Enrollment.bulkCreate(
      [
        { cohortId: a.id, studentId: s1.user.id },
        { cohortId: a.id, studentId: s2.user.id },
        { cohortId: b.id, studentId: s3.user.id },
      ],
      { transaction },
    );
    const assignment = await Assignment.create({ cohortId: a.id, moduleId, dueAt: new Date(Date.now() + 2 * DAY_MS), maxAttemptsPerQuiz: 3 }, { transaction });
    return { cohortA: a.id, cohortB: b.id, assignmentA: assignment.id };
  });
  return { t, moduleId, ...ids, own, other, admin, s1, s2, s3, outsider };
}

/** Submit answers to a fixture quiz as a student; returns the graded attempt. */
export async function submitQuiz(s: Signed, quizId: string, answers: Record<string, unknown>) {
  const view = await s.agent.get(`/api/quizzes/${quizId}`).expect(200);
  const res = await s.agent
    .post(`/api/quizzes/${quizId}/attempts`)
    .set("x-csrf-token", s.csrfToken)
    .send({ idempotencyKey: newKey(), drawId: view.body.drawId, answers });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as { score: number; maxScore: number; passed: boolean };
}

/** Passing answers for fixture-quiz (3 of 6 marks; pass mark 50 %). */
export const PASSING_ANSWERS = {
  "q-single": { kind: "single", choice: "austenite" },
  "q-multiple": { kind: "multiple", choices: ["v", "cr"] },
  "q-eutectoid": { kind: "numeric", value: 727, unit: "degC" },
};
/** One right, two wrong (a common wrong answer "Ferrite"). */
export const FAILING_ANSWERS = {
  "q-single": { kind: "single", choice: "ferrite" },
  "q-multiple": { kind: "multiple", choices: ["ni"] },
  "q-eutectoid": { kind: "numeric", value: 727, unit: "degC" },
};

/** Wait until queued invitation e-mails have been sent (or have failed). */
export async function mailSettled(t: TestApp): Promise<void> {
  await teachingRuntimeOf(t.db)?.invitations.idle();
}

export async function outbox(t: TestApp) {
  return t.db.read(() => t.db.models.OutboxMessage.findAll({ order: [["id", "ASC"]] }));
}

/** The invitation link (path and token) in the most recent message to `email`. */
export async function invitationLinkFor(t: TestApp, email: string): Promise<{ url: string; token: string }> {
  await mailSettled(t);
  const messages = (await outbox(t)).filter((m) => m.toAddress.includes(email));
  expect(messages.length, `no e-mail to ${email}`).toBeGreaterThan(0);
  const text = messages[messages.length - 1].text;
  const match = /(https?:\/\/\S+\/invite\/([A-Za-z0-9_-]{43}))/.exec(text);
  expect(match, text).not.toBeNull();
  return { url: match![1], token: match![2] };
}

/** A digest of every row of the tables an instructor/admin route may change (for "denied writes change nothing"). */
export async function dbSnapshot(t: TestApp): Promise<string> {
  const tables = ["Users", "Cohorts", "Enrollments", "Assignments", "Invitations", "ReminderLogs", "Modules", "QuizAttempts", "LessonProgress"];
  const parts: string[] = [];
  for (const table of tables) {
    const [rows] = await t.db.sequelize.query(`SELECT * FROM ${table} ORDER BY id`);
    parts.push(`${table}:${JSON.stringify(rows)}`);
  }
  return parts.join("\n");
}
